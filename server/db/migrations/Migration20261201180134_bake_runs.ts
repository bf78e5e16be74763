import { Migration } from '@mikro-orm/migrations';

export class Migration20261201180134_bake_runs extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "oven" ("id" serial primary key, "workspace_id" int not null, "name" varchar(60) not null, "racks" int not null, "trays_per_rack" int not null, "convection" boolean not null default false, "heat_fper_min" numeric(8,4) not null default '25', "cool_fper_min" numeric(8,4) not null default '15', "max_f" numeric(8,4) not null default '500', "is_demo" boolean not null default false, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`alter table "oven" add constraint "oven_workspace_id_name_unique" unique ("workspace_id", "name");`);

    this.addSql(`create table "bake_run_setting" ("id" serial primary key, "workspace_id" int not null, "week_id" int not null, "prep_date" varchar(10) not null, "start" varchar(16) not null, "cooks" int not null, "hands_on_minutes" jsonb not null default '{}', "oven_ids" jsonb not null default '[]', "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`alter table "bake_run_setting" add constraint "bake_run_setting_week_id_prep_date_unique" unique ("week_id", "prep_date");`);

    this.addSql(`create table "bake_rule" ("id" serial primary key, "workspace_id" int not null, "category" varchar(40) not null, "label" varchar(120) not null, "temp_f" numeric(8,4) not null, "min_minutes" int not null, "max_minutes" int not null, "hands_on_minutes" int not null, "tolerance_f" numeric(8,4) not null default '10', "doneness_cue" text not null default '', "min_internal_f" numeric(8,4) null, "rest_minutes" int not null default 0, "min_internal_source" varchar(200) null, "rack_preference" varchar(10) not null default 'any', "convection_delta_f" numeric(8,4) not null default '25', "crowding_pct" numeric(8,4) not null default '10', "bake_source" varchar(200) not null default 'common practice, no source', "note" text not null default '', "deleted_at" timestamptz null, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`alter table "bake_rule" add constraint "bake_rule_workspace_id_category_unique" unique ("workspace_id", "category");`);

    this.addSql(`alter table "oven" add constraint "oven_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);

    this.addSql(`alter table "bake_run_setting" add constraint "bake_run_setting_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "bake_run_setting" add constraint "bake_run_setting_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "bake_rule" add constraint "bake_rule_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "oven" cascade;`);

    this.addSql(`drop table if exists "bake_run_setting" cascade;`);

    this.addSql(`drop table if exists "bake_rule" cascade;`);
  }

}
