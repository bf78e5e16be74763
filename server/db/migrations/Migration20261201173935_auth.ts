import { Migration } from '@mikro-orm/migrations';

export class Migration20261201173935_auth extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "app_user" ("id" serial primary key, "email" varchar(254) not null, "name" varchar(120) not null, "password_hash" varchar(255) not null, "unit_system" varchar(10) not null default 'us', "temp_unit" varchar(1) not null default 'F', "version" int not null default 1, "created_at" timestamptz not null);`);
    this.addSql(`alter table "app_user" add constraint "app_user_email_unique" unique ("email");`);

    this.addSql(`create table "password_reset" ("id" serial primary key, "user_id" int not null, "token_hash" varchar(64) not null, "expires_at" timestamptz not null, "used_at" timestamptz null, "created_at" timestamptz not null);`);
    this.addSql(`alter table "password_reset" add constraint "password_reset_token_hash_unique" unique ("token_hash");`);

    this.addSql(`create table "workspace" ("id" serial primary key, "name" varchar(120) not null, "net_carb_rule" varchar(40) not null default 'half-other-polyols', "meal_slots" jsonb not null default '["breakfast"]', "is_demo" boolean not null default false, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`);

    this.addSql(`create table "membership" ("id" serial primary key, "user_id" int not null, "workspace_id" int not null, "role" varchar(20) not null, "client_id" int null, "created_at" timestamptz not null);`);
    this.addSql(`alter table "membership" add constraint "membership_user_id_workspace_id_unique" unique ("user_id", "workspace_id");`);

    this.addSql(`create table "invitation" ("id" serial primary key, "workspace_id" int not null, "email" varchar(254) not null, "role" varchar(20) not null, "client_id" int null, "token_hash" varchar(64) not null, "expires_at" timestamptz not null, "accepted_at" timestamptz null, "invited_by_id" int not null, "created_at" timestamptz not null);`);
    this.addSql(`alter table "invitation" add constraint "invitation_token_hash_unique" unique ("token_hash");`);

    this.addSql(`alter table "password_reset" add constraint "password_reset_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade;`);

    this.addSql(`alter table "membership" add constraint "membership_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade;`);
    this.addSql(`alter table "membership" add constraint "membership_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);

    this.addSql(`alter table "invitation" add constraint "invitation_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade;`);
    this.addSql(`alter table "invitation" add constraint "invitation_invited_by_id_foreign" foreign key ("invited_by_id") references "app_user" ("id") on update cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "password_reset" drop constraint "password_reset_user_id_foreign";`);

    this.addSql(`alter table "membership" drop constraint "membership_user_id_foreign";`);

    this.addSql(`alter table "invitation" drop constraint "invitation_invited_by_id_foreign";`);

    this.addSql(`alter table "membership" drop constraint "membership_workspace_id_foreign";`);

    this.addSql(`alter table "invitation" drop constraint "invitation_workspace_id_foreign";`);

    this.addSql(`drop table if exists "app_user" cascade;`);

    this.addSql(`drop table if exists "password_reset" cascade;`);

    this.addSql(`drop table if exists "workspace" cascade;`);

    this.addSql(`drop table if exists "membership" cascade;`);

    this.addSql(`drop table if exists "invitation" cascade;`);
  }

}
