import { Migration } from '@mikro-orm/migrations';

/** Tables used outside the ORM: sessions (connect-pg-simple's schema) and login rate-limit counters. */
export class Migration20261201173936_session extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table "session" ("sid" varchar not null collate "default", "sess" json not null, "expire" timestamp(6) not null, constraint "session_pkey" primary key ("sid"));`);
    this.addSql(`create index "IDX_session_expire" on "session" ("expire");`);
    this.addSql(`create table "rate_limit_hit" ("key" varchar(300) primary key, "hits" int not null, "reset_at" timestamptz not null);`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "rate_limit_hit";`);
    this.addSql(`drop table if exists "session";`);
  }
}
