import { Migration } from '@mikro-orm/migrations';

/** The workspace a person last chose (someone in several): a new sign-in works there. */
export class Migration20261202200000_last_workspace extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "app_user" add column "last_workspace_id" int null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "app_user" drop column "last_workspace_id";`);
  }

}
