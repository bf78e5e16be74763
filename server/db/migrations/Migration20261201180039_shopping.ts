import { Migration } from '@mikro-orm/migrations';

export class Migration20261201180039_shopping extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "shopping_purchase" ("id" serial primary key, "workspace_id" int not null, "week_id" int not null, "bought_by_id" int null, "bought_at" timestamptz not null, "changes" jsonb not null default '[]');`);
    this.addSql(`alter table "shopping_purchase" add constraint "shopping_purchase_week_id_unique" unique ("week_id");`);
    this.addSql(`create table "shopping_check" ("id" serial primary key, "workspace_id" int not null, "week_id" int not null, "ingredient_id" int not null, "checked" boolean not null default false, "checked_by_id" int null, "checked_at" timestamptz null);`);
    this.addSql(`alter table "shopping_check" add constraint "shopping_check_week_id_ingredient_id_unique" unique ("week_id", "ingredient_id");`);
    this.addSql(`alter table "shopping_purchase" add constraint "shopping_purchase_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "shopping_purchase" add constraint "shopping_purchase_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "shopping_purchase" add constraint "shopping_purchase_bought_by_id_foreign" foreign key ("bought_by_id") references "app_user" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "shopping_check" add constraint "shopping_check_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "shopping_check" add constraint "shopping_check_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "shopping_check" add constraint "shopping_check_ingredient_id_foreign" foreign key ("ingredient_id") references "ingredient" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "shopping_check" add constraint "shopping_check_checked_by_id_foreign" foreign key ("checked_by_id") references "app_user" ("id") on update cascade on delete set null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "shopping_check" cascade;`);
    this.addSql(`drop table if exists "shopping_purchase" cascade;`);
  }

}
