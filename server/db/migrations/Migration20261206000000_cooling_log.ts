import { Migration } from '@mikro-orm/migrations';

/**
 * Cooling records are the kitchen's food-safety log: deleting a week no longer deletes them (its week becomes null),
 * and the log reads them by workspace and prep date.
 */
export class Migration20261206000000_cooling_log extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "cooling_record" drop constraint "cooling_record_week_id_foreign";`);
    this.addSql(`alter table "cooling_record" alter column "week_id" drop not null;`);
    this.addSql(`alter table "cooling_record" add constraint "cooling_record_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete set null;`);
    this.addSql(`create index "cooling_record_workspace_id_prep_date_index" on "cooling_record" ("workspace_id", "prep_date");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index "cooling_record_workspace_id_prep_date_index";`);
    this.addSql(`delete from "cooling_record" where "week_id" is null;`);
    this.addSql(`alter table "cooling_record" drop constraint "cooling_record_week_id_foreign";`);
    this.addSql(`alter table "cooling_record" alter column "week_id" set not null;`);
    this.addSql(`alter table "cooling_record" add constraint "cooling_record_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);
  }

}
