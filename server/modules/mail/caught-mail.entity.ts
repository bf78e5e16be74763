import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

/**
 * A message caught by the local mail catcher (development and tests; see mail-catcher.ts). Written with plain SQL by
 * the catcher process, read by the dev mail page. Every message is stored, duplicates included.
 */
export const CaughtMail = defineEntity({
  name: 'CaughtMail',
  tableName: 'caught_mail',
  properties: {
    id: p.integer().primary().autoincrement(),
    receivedAt: p.datetime(),
    messageId: p.string().length(300).nullable().index(),
    from: p.text(),
    to: p.text(),
    subject: p.text(),
    text: p.text().nullable(),
    html: p.text().nullable(),
  },
});
export type ICaughtMail = InferEntity<typeof CaughtMail>;

export const CaughtMailAttachment = defineEntity({
  name: 'CaughtMailAttachment',
  tableName: 'caught_mail_attachment',
  uniques: [{ properties: ['mail', 'position'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    mail: () => p.manyToOne(CaughtMail).ref().deleteRule('cascade'),
    /** 0-based order of the attachment in the message. */
    position: p.integer(),
    filename: p.text(),
    contentType: p.string().length(200),
    size: p.integer(),
    content: p.blob().lazy(),
  },
});
export type ICaughtMailAttachment = InferEntity<typeof CaughtMailAttachment>;
