import { Migration } from '@mikro-orm/migrations';

export class Migration20261201175140_pantry extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "pantry_item" ("id" serial primary key, "workspace_id" int not null, "ingredient_id" int not null, "amount" numeric(14,4) not null, "unit" varchar(40) not null, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`alter table "pantry_item" add constraint "pantry_item_workspace_id_ingredient_id_unique" unique ("workspace_id", "ingredient_id");`);

    this.addSql(`alter table "pantry_item" add constraint "pantry_item_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "pantry_item" add constraint "pantry_item_ingredient_id_foreign" foreign key ("ingredient_id") references "ingredient" ("id") on update cascade on delete cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "pantry_item" cascade;`);
  }

}
