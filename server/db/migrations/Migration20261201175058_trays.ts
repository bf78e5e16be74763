import { Migration } from '@mikro-orm/migrations';

export class Migration20261201175058_trays extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "tray" ("id" serial primary key, "workspace_id" int not null, "name" varchar(120) not null, "description" text not null default '', "pan_code" varchar(20) not null, "pan_length" numeric(12,4) null, "pan_width" numeric(12,4) null, "pan_unit" varchar(2) not null default 'in', "pan_lining" varchar(20) not null default 'parchment', "bake_category" varchar(40) not null, "bake_temp_f" int not null, "bake_min_minutes" int not null, "bake_max_minutes" int not null, "yield_factor" numeric(12,4) not null default '1', "cut_kind" varchar(10) not null default 'grid', "cut_rows" int null, "cut_columns" int null, "cut_pieces" int null, "fridge_days" int not null, "freezer_weeks" int not null, "reheat_steps" jsonb not null default '[]', "tags" jsonb not null default '[]', "is_demo" boolean not null default false, "archived" boolean not null default false, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`create index "tray_workspace_id_archived_index" on "tray" ("workspace_id", "archived");`);

    this.addSql(`create table "tray_photo" ("id" serial primary key, "workspace_id" int not null, "tray_id" int not null, "content_type" varchar(40) not null, "byte_size" int not null, "width" int not null, "height" int not null, "file_path" varchar(255) not null, "thumb_path" varchar(255) not null, "sha256" varchar(64) not null, "version" int not null default 1, "created_at" timestamptz not null);`);
    this.addSql(`alter table "tray_photo" add constraint "tray_photo_tray_id_unique" unique ("tray_id");`);

    this.addSql(`create table "tray_line" ("id" serial primary key, "tray_id" int not null, "position" int not null, "ingredient_id" int not null, "amount_text" varchar(40) not null, "amount" numeric(14,6) not null, "unit" varchar(40) not null, "note" varchar(200) not null default '');`);

    this.addSql(`alter table "tray" add constraint "tray_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);

    this.addSql(`alter table "tray_photo" add constraint "tray_photo_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "tray_photo" add constraint "tray_photo_tray_id_foreign" foreign key ("tray_id") references "tray" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "tray_line" add constraint "tray_line_tray_id_foreign" foreign key ("tray_id") references "tray" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "tray_line" add constraint "tray_line_ingredient_id_foreign" foreign key ("ingredient_id") references "ingredient" ("id") on update cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "tray_photo" drop constraint "tray_photo_tray_id_foreign";`);

    this.addSql(`alter table "tray_line" drop constraint "tray_line_tray_id_foreign";`);

    this.addSql(`drop table if exists "tray" cascade;`);

    this.addSql(`drop table if exists "tray_photo" cascade;`);

    this.addSql(`drop table if exists "tray_line" cascade;`);
  }

}
