import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * Attachment renderers by kind (PDFs, calendar files). A mail's attachments are stored as `{ pdf: kind, payload }`
 * (ids, never bytes; the field keeps the name it had when every attachment was a PDF); the send job calls the
 * renderer registered for the kind at send time, with a fresh EntityManager, so the file shows the data as it is
 * when the mail leaves. Modules register at import time, e.g. the week board:
 *
 *   registerAttachment('week-plan', async (em, payload) => renderWeekPlanPdf(await weekPlanPdfData(em, payload)));
 *
 * The registry is code wiring (the same in every process), not state.
 */
export interface RenderedAttachment {
  filename: string;
  buffer: Buffer;
  /** MIME type; a PDF when left out. */
  contentType?: string;
}
export type AttachmentRenderer = (em: EntityManager, payload: Record<string, unknown>) => Promise<RenderedAttachment>;

const renderers = new Map<string, AttachmentRenderer>();

export function registerAttachment(kind: string, render: AttachmentRenderer): void {
  renderers.set(kind, render);
}

export function attachmentRenderer(kind: string): AttachmentRenderer | undefined {
  return renderers.get(kind);
}

export class MissingAttachmentRenderer extends Error {
  constructor(kind: string) {
    super(`No attachment renderer is registered for "${kind}"`);
    this.name = 'MissingAttachmentRenderer';
  }
}
