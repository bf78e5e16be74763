import { Migration } from '@mikro-orm/migrations';

/** Mail: the outbox (one row per e-mail; pg-boss jobs live in schema `pgboss`, made by pg-boss itself) and the local catcher's store. */
export class Migration20261201174819_mail extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "caught_mail" ("id" serial primary key, "received_at" timestamptz not null, "message_id" varchar(300) null, "from" text not null, "to" text not null, "subject" text not null, "text" text null, "html" text null);`);
    this.addSql(`create index "caught_mail_message_id_index" on "caught_mail" ("message_id");`);

    this.addSql(`create table "caught_mail_attachment" ("id" serial primary key, "mail_id" int not null, "position" int not null, "filename" text not null, "content_type" varchar(200) not null, "size" int not null, "content" bytea not null);`);
    this.addSql(`alter table "caught_mail_attachment" add constraint "caught_mail_attachment_mail_id_position_unique" unique ("mail_id", "position");`);

    this.addSql(`create table "outbox" ("id" serial primary key, "workspace_id" int null, "kind" varchar(30) not null, "to" varchar(254) not null, "subject" varchar(300) not null, "text" text not null, "html" text null, "status" varchar(20) not null default 'queued', "attempts" int not null default 0, "last_error" text null, "idempotency_key" varchar(64) not null, "client_id" int null, "week_id" int null, "batch_id" varchar(36) null, "note" text null, "attachments" jsonb not null default '[]', "created_at" timestamptz not null, "updated_at" timestamptz not null, "sent_at" timestamptz null);`);
    this.addSql(`alter table "outbox" add constraint "outbox_idempotency_key_unique" unique ("idempotency_key");`);
    this.addSql(`create index "outbox_workspace_id_status_index" on "outbox" ("workspace_id", "status");`);
    this.addSql(`create index "outbox_workspace_id_client_id_index" on "outbox" ("workspace_id", "client_id");`);
    this.addSql(`create index "outbox_batch_id_index" on "outbox" ("batch_id");`);

    this.addSql(`alter table "caught_mail_attachment" add constraint "caught_mail_attachment_mail_id_foreign" foreign key ("mail_id") references "caught_mail" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "outbox" add constraint "outbox_workspace_id_foreign" foreign key ("workspace_id") references "workspace" ("id") on update cascade on delete set null;`);

  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "caught_mail_attachment" cascade;`);
    this.addSql(`drop table if exists "caught_mail" cascade;`);

    this.addSql(`drop table if exists "outbox" cascade;`);

  }

}
