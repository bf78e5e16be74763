import { Migration } from '@mikro-orm/migrations';

export class Migration20261201175816_weeks extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "week" ("id" serial primary key, "workspace_id" int not null, "name" varchar(120) not null default '', "start_date" varchar(10) not null, "prep_date" varchar(10) not null, "second_prep_date" varchar(10) null, "published_version" int null, "published_board_version" int null, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`create index "week_workspace_id_start_date_index" on "week" ("workspace_id", "start_date");`);

    this.addSql(`create table "week_publication" ("id" serial primary key, "workspace_id" int not null, "week_id" int not null, "number" int not null, "snapshot" jsonb not null, "published_by" int not null, "published_at" timestamptz not null);`);
    this.addSql(`alter table "week_publication" add constraint "week_publication_week_id_number_unique" unique ("week_id", "number");`);

    this.addSql(`create table "week_tray" ("id" serial primary key, "week_id" int not null, "tray_id" int not null, "prep_date" varchar(10) not null, "tray_count" int not null);`);
    this.addSql(`alter table "week_tray" add constraint "week_tray_week_id_tray_id_prep_date_unique" unique ("week_id", "tray_id", "prep_date");`);

    this.addSql(`create table "assembly" ("id" serial primary key, "workspace_id" int not null, "name" varchar(120) not null, "description" text not null default '', "assembly_steps" jsonb not null default '[]', "reheat_steps" jsonb not null default '[]', "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`create index "assembly_workspace_id_name_index" on "assembly" ("workspace_id", "name");`);

    this.addSql(`create table "week_cell" ("id" serial primary key, "week_id" int not null, "client_id" int not null, "date" varchar(10) not null, "slot" varchar(40) not null, "assembly_id" int not null, "prep_date" varchar(10) null, "storage" varchar(10) not null default 'fridge', "allergen_overrides" jsonb not null default '[]');`);
    this.addSql(`alter table "week_cell" add constraint "week_cell_week_id_client_id_date_slot_unique" unique ("week_id", "client_id", "date", "slot");`);

    this.addSql(`create table "assembly_item" ("id" serial primary key, "assembly_id" int not null, "position" int not null, "tray_id" int null, "portions" numeric(8,2) null, "ingredient_id" int null, "amount_text" varchar(40) not null default '', "amount" numeric(14,6) null, "unit" varchar(40) not null default '', "note" varchar(200) not null default '');`);
    this.addSql(`create index "assembly_item_assembly_id_index" on "assembly_item" ("assembly_id");`);

    this.addSql(`alter table "week" add constraint "week_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);

    this.addSql(`alter table "week_publication" add constraint "week_publication_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "week_publication" add constraint "week_publication_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "week_tray" add constraint "week_tray_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "week_tray" add constraint "week_tray_tray_id_foreign" foreign key ("tray_id") references "tray" ("id") on update cascade;`);

    this.addSql(`alter table "assembly" add constraint "assembly_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);

    this.addSql(`alter table "week_cell" add constraint "week_cell_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "week_cell" add constraint "week_cell_client_id_foreign" foreign key ("client_id") references "client" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "week_cell" add constraint "week_cell_assembly_id_foreign" foreign key ("assembly_id") references "assembly" ("id") on update cascade;`);

    this.addSql(`alter table "assembly_item" add constraint "assembly_item_assembly_id_foreign" foreign key ("assembly_id") references "assembly" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "assembly_item" add constraint "assembly_item_tray_id_foreign" foreign key ("tray_id") references "tray" ("id") on update cascade on delete restrict;`);
    this.addSql(`alter table "assembly_item" add constraint "assembly_item_ingredient_id_foreign" foreign key ("ingredient_id") references "ingredient" ("id") on update cascade on delete restrict;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "week_publication" drop constraint "week_publication_week_id_foreign";`);

    this.addSql(`alter table "week_tray" drop constraint "week_tray_week_id_foreign";`);

    this.addSql(`alter table "week_cell" drop constraint "week_cell_week_id_foreign";`);

    this.addSql(`alter table "week_cell" drop constraint "week_cell_assembly_id_foreign";`);

    this.addSql(`alter table "assembly_item" drop constraint "assembly_item_assembly_id_foreign";`);

    this.addSql(`drop table if exists "week" cascade;`);

    this.addSql(`drop table if exists "week_publication" cascade;`);

    this.addSql(`drop table if exists "week_tray" cascade;`);

    this.addSql(`drop table if exists "assembly" cascade;`);

    this.addSql(`drop table if exists "week_cell" cascade;`);

    this.addSql(`drop table if exists "assembly_item" cascade;`);
  }

}
