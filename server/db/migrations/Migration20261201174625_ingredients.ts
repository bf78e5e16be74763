import { Migration } from '@mikro-orm/migrations';

export class Migration20261201174625_ingredients extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "ingredient" ("id" serial primary key, "workspace_id" int null, "slug" varchar(80) null, "name" varchar(160) not null, "category" varchar(40) not null default 'other', "kcal" numeric(12,4) not null, "fat_g" numeric(12,4) not null, "sat_fat_g" numeric(12,4) not null default '0', "protein_g" numeric(12,4) not null, "carbs_g" numeric(12,4) not null, "fiber_g" numeric(12,4) not null default '0', "sugars_g" numeric(12,4) not null default '0', "erythritol_g" numeric(12,4) not null default '0', "allulose_g" numeric(12,4) not null default '0', "other_polyols_g" numeric(12,4) not null default '0', "sodium_mg" numeric(12,4) not null default '0', "density_g_per_ml" numeric(12,4) null, "density_source" text null, "piece_weights" jsonb not null default '{}', "allergens" jsonb not null default '[]', "purchase_amount" numeric(12,4) null, "purchase_unit" varchar(40) null, "purchase_label" varchar(120) null, "price_cents" int null, "aisle" varchar(40) null, "source" text not null default '', "provenance" varchar(40) null, "fdc_id" int null, "note" text null, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`alter table "ingredient" add constraint "ingredient_slug_unique" unique ("slug");`);
    this.addSql(`create index "ingredient_workspace_id_name_index" on "ingredient" ("workspace_id", "name");`);

    this.addSql(`alter table "ingredient" add constraint "ingredient_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade on delete cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "ingredient" cascade;`);
  }

}
