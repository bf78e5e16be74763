import { Migration } from '@mikro-orm/migrations';

/** An archived plate leaves the plates list and the board's pickers; boards and plans that name it keep it. */
export class Migration20261202190000_plate_archive extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "assembly" add column "archived" boolean not null default false;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "assembly" drop column "archived";`);
  }

}
