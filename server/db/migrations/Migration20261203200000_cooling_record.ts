import { Migration } from '@mikro-orm/migrations';

/** The cooling record of a prep day's trays: time out, food temperatures while cooling, restart, thrown away. */
export class Migration20261203200000_cooling_record extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "cooling_record" ("id" serial primary key, "workspace_id" int not null, "week_id" int not null, "prep_date" varchar(10) not null, "run_tray_id" varchar(16) not null, "tray_name" varchar(200) not null, "out_at" varchar(16) not null, "restarted_at" varchar(16) null, "readings" jsonb not null default '[]', "discarded" boolean not null default false, "note" text not null default '', "recorded_by" varchar(200) not null, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);
    this.addSql(`alter table "cooling_record" add constraint "cooling_record_week_id_prep_date_run_tray_id_unique" unique ("week_id", "prep_date", "run_tray_id");`);
    this.addSql(`alter table "cooling_record" add constraint "cooling_record_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "cooling_record" add constraint "cooling_record_week_id_foreign" foreign key ("week_id") references "week" ("id") on update cascade on delete cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "cooling_record" cascade;`);
  }

}
