import { Migration } from '@mikro-orm/migrations';

/** The columns people name things in, with their length (the entity's own). */
const NAMED: readonly [table: string, column: string, length: number][] = [
  ['app_user', 'name', 120],
  ['workspace', 'name', 120],
  ['client', 'name', 120],
  ['ingredient', 'name', 160],
  ['tray', 'name', 120],
  ['assembly', 'name', 120],
  ['week', 'name', 120],
  ['bake_rule', 'label', 120],
  ['oven', 'name', 60],
];

/**
 * Names sort as people read them: "almond flour" before "Bacon" and "Plate 2" before "Plate 10". The database's own
 * collation (C.UTF-8 from our scripts) sorts by code point: every capital before every small letter, "10" before "2".
 * An ICU collation (CLDR root order, numeric) on the named columns makes every `order by name` read that way, paged
 * lists included. Deterministic, so equality, unique indexes and LIKE stay as they were. The pages' own sorts use the
 * same rules (compareNames in shared/domain/words.ts).
 */
export class Migration20261207000000_name_order extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create collation if not exists "name_order" (provider = icu, locale = 'und-u-kn-true');`);
    for (const [table, column, length] of NAMED) {
      this.addSql(`alter table "${table}" alter column "${column}" type varchar(${length}) collate "name_order";`);
    }
  }

  override async down(): Promise<void> {
    for (const [table, column, length] of NAMED) {
      this.addSql(`alter table "${table}" alter column "${column}" type varchar(${length}) collate "default";`);
    }
    this.addSql(`drop collation if exists "name_order";`);
  }

}
