import { Migration } from '@mikro-orm/migrations';

/**
 * The kitchen's time zone (an IANA name such as 'America/Chicago'), or null while the coach has not set it. With it
 * the server knows the kitchen's time and watches cooling deadlines; without it nothing is watched.
 */
export class Migration20261205000000_kitchen_time_zone extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "workspace" add column "time_zone" varchar(64) null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "workspace" drop column "time_zone";`);
  }

}
