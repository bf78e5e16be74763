import { Migration } from '@mikro-orm/migrations';

/** How the workspace writes dates in words: 'month-day' ("Mon, Dec 7") or 'day-month' ("Mon 7 Dec"). */
export class Migration20261203100000_date_order extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "workspace" add column "date_order" varchar(10) not null default 'month-day';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "workspace" drop column "date_order";`);
  }

}
