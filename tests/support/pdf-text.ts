import { PDFParse } from 'pdf-parse';
import type { Member } from './factories.js';

/** A PDF's text (read with pdf-parse), whitespace folded to single spaces. */
export async function pdfText(buf: Buffer | Uint8Array): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(buf) });
  const text = (await parser.getText()).text.replace(/\s+/g, ' ');
  await parser.destroy();
  return text;
}

/** The text of the PDF an API address answers (200 expected), as `pdfText` reads it. */
export async function pdfTextOf(agent: Member['agent'], url: string): Promise<string> {
  const res = await agent
    .get(url)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    })
    .expect(200);
  return pdfText(res.body as Buffer);
}
