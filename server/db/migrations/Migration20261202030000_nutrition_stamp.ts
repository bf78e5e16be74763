import { Migration } from '@mikro-orm/migrations';

/**
 * A version stamp per workspace for everything the nutrition engine reads from the database: the workspace's own
 * ingredients, the shared ones and the workspace's net-carb rule. Triggers move it on every write, whoever writes
 * (the API, an import, a seed, SQL by hand); the session read returns it with the signed-in person, so a process may
 * keep library rows it has read and trust them exactly while the stamp is unchanged (server/modules/ingredients/
 * calc-rows-cache.ts). Values are microseconds since the epoch and only grow: a stamp never comes back, even after
 * a table is emptied and its ids start again. Outside the ORM (like the session table).
 */
export class Migration20261202030000_nutrition_stamp extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table "nutrition_stamp" ("workspace_id" int primary key references "workspace" ("id") on update cascade on delete cascade, "version" bigint not null);`);
    this.addSql(`create function trayline_now_us() returns bigint language sql volatile as $$ select (extract(epoch from clock_timestamp()) * 1000000)::bigint $$;`);
    this.addSql(`insert into "nutrition_stamp" ("workspace_id", "version") select "id", trayline_now_us() from "workspace";`);

    this.addSql(`create function trayline_stamp_new_workspace() returns trigger language plpgsql as $$
begin
  insert into nutrition_stamp (workspace_id, version) values (new.id, trayline_now_us());
  return null;
end $$;`);
    this.addSql(`create trigger "workspace_nutrition_stamp" after insert on "workspace" for each row execute function trayline_stamp_new_workspace();`);

    this.addSql(`create function trayline_bump_net_carb_rule() returns trigger language plpgsql as $$
begin
  update nutrition_stamp set version = greatest(version + 1, trayline_now_us()) where workspace_id = new.id;
  return null;
end $$;`);
    this.addSql(`create trigger "workspace_net_carb_rule_stamp" after update of "net_carb_rule" on "workspace" for each row when (old.net_carb_rule is distinct from new.net_carb_rule) execute function trayline_bump_net_carb_rule();`);

    // One function for the ingredient triggers: the workspaces whose rows changed move; a shared row (no workspace)
    // is read by every workspace, so all of them move.
    this.addSql(`create function trayline_bump_ingredients() returns trigger language plpgsql as $$
declare
  touched int[];
  shared boolean;
begin
  if tg_op = 'TRUNCATE' then
    shared := true;
  elsif tg_op = 'INSERT' then
    select array_agg(distinct workspace_id), bool_or(workspace_id is null) into touched, shared from new_rows;
  elsif tg_op = 'DELETE' then
    select array_agg(distinct workspace_id), bool_or(workspace_id is null) into touched, shared from old_rows;
  else
    select array_agg(distinct w), bool_or(w is null) into touched, shared
      from (select workspace_id as w from new_rows union all select workspace_id from old_rows) changed;
  end if;
  if shared then
    update nutrition_stamp set version = greatest(version + 1, trayline_now_us());
  elsif touched is not null then
    update nutrition_stamp set version = greatest(version + 1, trayline_now_us()) where workspace_id = any(touched);
  end if;
  return null;
end $$;`);
    this.addSql(`create trigger "ingredient_stamp_insert" after insert on "ingredient" referencing new table as new_rows for each statement execute function trayline_bump_ingredients();`);
    this.addSql(`create trigger "ingredient_stamp_update" after update on "ingredient" referencing old table as old_rows new table as new_rows for each statement execute function trayline_bump_ingredients();`);
    this.addSql(`create trigger "ingredient_stamp_delete" after delete on "ingredient" referencing old table as old_rows for each statement execute function trayline_bump_ingredients();`);
    this.addSql(`create trigger "ingredient_stamp_truncate" after truncate on "ingredient" for each statement execute function trayline_bump_ingredients();`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop trigger if exists "ingredient_stamp_truncate" on "ingredient";`);
    this.addSql(`drop trigger if exists "ingredient_stamp_delete" on "ingredient";`);
    this.addSql(`drop trigger if exists "ingredient_stamp_update" on "ingredient";`);
    this.addSql(`drop trigger if exists "ingredient_stamp_insert" on "ingredient";`);
    this.addSql(`drop function if exists trayline_bump_ingredients();`);
    this.addSql(`drop trigger if exists "workspace_net_carb_rule_stamp" on "workspace";`);
    this.addSql(`drop function if exists trayline_bump_net_carb_rule();`);
    this.addSql(`drop trigger if exists "workspace_nutrition_stamp" on "workspace";`);
    this.addSql(`drop function if exists trayline_stamp_new_workspace();`);
    this.addSql(`drop table if exists "nutrition_stamp";`);
    this.addSql(`drop function if exists trayline_now_us();`);
  }
}
