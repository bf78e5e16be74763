import { Migration } from '@mikro-orm/migrations';

/**
 * A workspace's own ingredient names are unique, whatever their case, in the database too: the services check first
 * ("Your library already has …"), and this index stops two saves or imports of one new name at the same instant
 * from both landing (the second answers 409). Names already taken twice (possible only through that race) are told
 * apart first by their id, so the index can be built; the shared library (no workspace) is not covered.
 */
export class Migration20261208000000_ingredient_name_unique extends Migration {

  override async up(): Promise<void> {
    this.addSql(`update "ingredient" i set "name" = left(i."name", 140) || ' (#' || i."id" || ')'
      from (select "id", row_number() over (partition by "workspace_id", lower("name") order by "id") as n
            from "ingredient" where "workspace_id" is not null) d
      where d."id" = i."id" and d.n > 1;`);
    this.addSql(`create unique index "ingredient_workspace_id_name_unique" on "ingredient" ("workspace_id", lower("name")) where "workspace_id" is not null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "ingredient_workspace_id_name_unique";`);
  }

}
