import { Migration } from '@mikro-orm/migrations';

/** When a client was archived (paused or left): they leave the client list and the boards of weeks without their plates. */
export class Migration20261202100759_client_archive extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "client" add column "archived_at" timestamptz null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "client" drop column "archived_at";`);
  }

}
