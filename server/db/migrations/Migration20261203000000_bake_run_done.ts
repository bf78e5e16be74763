import { Migration } from '@mikro-orm/migrations';

/** A prep day's run planned again part-way: the trays already out, as they were planned, and when the rest starts. */
export class Migration20261203000000_bake_run_done extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "bake_run_setting" add column "done" jsonb null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "bake_run_setting" drop column "done";`);
  }

}
