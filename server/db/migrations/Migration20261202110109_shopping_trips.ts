import { Migration } from '@mikro-orm/migrations';

/**
 * Shopping trips: in a week with two prep days, each prep day has its own list (what its trays and the plates it
 * supplies need) with its own check marks and "bought" record, numbered 1 and 2; 0 stays the whole week's list.
 */
export class Migration20261202110109_shopping_trips extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "shopping_purchase" drop constraint "shopping_purchase_week_id_unique";`);

    this.addSql(`alter table "shopping_purchase" add column "trip" smallint not null default 0;`);
    this.addSql(`alter table "shopping_purchase" add constraint "shopping_purchase_week_id_trip_unique" unique ("week_id", "trip");`);

    this.addSql(`alter table "shopping_check" drop constraint "shopping_check_week_id_ingredient_id_unique";`);

    this.addSql(`alter table "shopping_check" add column "trip" smallint not null default 0;`);
    this.addSql(`alter table "shopping_check" add constraint "shopping_check_week_id_trip_ingredient_id_unique" unique ("week_id", "trip", "ingredient_id");`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "shopping_check" drop constraint "shopping_check_week_id_trip_ingredient_id_unique";`);
    this.addSql(`alter table "shopping_check" drop column "trip";`);

    this.addSql(`alter table "shopping_check" add constraint "shopping_check_week_id_ingredient_id_unique" unique ("week_id", "ingredient_id");`);

    this.addSql(`alter table "shopping_purchase" drop constraint "shopping_purchase_week_id_trip_unique";`);
    this.addSql(`alter table "shopping_purchase" drop column "trip";`);

    this.addSql(`alter table "shopping_purchase" add constraint "shopping_purchase_week_id_unique" unique ("week_id");`);
  }

}
