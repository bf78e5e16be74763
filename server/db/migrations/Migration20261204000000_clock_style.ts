import { Migration } from '@mikro-orm/migrations';

/** How the workspace writes a time of day: '24h' ("13:45", the default) or '12h' ("1:45 PM"). */
export class Migration20261204000000_clock_style extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "workspace" add column "clock" varchar(4) not null default '24h';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "workspace" drop column "clock";`);
  }

}
