import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * PDF renderers by kind. A mail's attachments are stored as `{ pdf: kind, payload }` (ids, never bytes); the send
 * job calls the renderer registered for the kind at send time, with a fresh EntityManager, so the PDF shows the
 * data as it is when the mail leaves. Modules register at import time, e.g. the week board:
 *
 *   registerPdf('week-plan', async (em, payload) => renderWeekPlanPdf(await weekPlanPdfData(em, payload)));
 *
 * The registry is code wiring (the same in every process), not state.
 */
export interface RenderedPdf {
  filename: string;
  buffer: Buffer;
}
export type PdfRenderer = (em: EntityManager, payload: Record<string, unknown>) => Promise<RenderedPdf>;

const renderers = new Map<string, PdfRenderer>();

export function registerPdf(kind: string, render: PdfRenderer): void {
  renderers.set(kind, render);
}

export function pdfRenderer(kind: string): PdfRenderer | undefined {
  return renderers.get(kind);
}

export class MissingPdfRenderer extends Error {
  constructor(kind: string) {
    super(`No PDF renderer is registered for "${kind}"`);
    this.name = 'MissingPdfRenderer';
  }
}
