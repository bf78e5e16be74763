import { Migration } from '@mikro-orm/migrations';

export class Migration20261201174850_clients extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "client" ("id" serial primary key, "workspace_id" int not null, "name" varchar(120) not null, "email" varchar(254) null, "household_multiplier" numeric(8,2) not null default '1', "sex" varchar(10) not null, "age_years" int not null, "height_cm" numeric(8,2) not null, "weight_kg" numeric(8,2) not null, "activity" varchar(20) not null, "goal" varchar(20) not null, "goal_adjustment" numeric(6,3) null, "net_carb_cap_g" numeric(8,2) not null default '20', "protein_g_per_kg" numeric(6,2) not null, "target_mode" varchar(10) not null default 'computed', "manual_targets" jsonb null, "slot_shares" jsonb not null default '{}', "allergens" jsonb not null default '[]', "dislikes" jsonb not null default '[]', "health_notes" text not null default '', "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`create index "client_workspace_id_name_index" on "client" ("workspace_id", "name");`);

    this.addSql(`alter table "client" add constraint "client_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "client" cascade;`);
  }

}
