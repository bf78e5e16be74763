import { useId, useRef, useState, type RefObject } from 'react';
import type { ImportProblem } from '@shared/schemas/csv-import';
import { ApiError, errorMessage } from '@/lib/problem';

/** A CSV file of the given columns and example rows, as a link target a browser downloads (a template to fill). */
export function csvTemplateHref(columns: readonly string[], rows: readonly (readonly string[])[]): string {
  const quote = (c: string) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c);
  const csv = [columns, ...rows].map((r) => r.map(quote).join(',')).join('\n') + '\n';
  return `data:text/csv;charset=utf-8,${encodeURIComponent(csv)}`;
}

/** A refused import's problems, one per line of the table: the file line, the column and why. */
export function ImportReport({ report }: { report: ImportProblem[] }) {
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="mb-1 text-left font-bold">Problems found (the header is line 1)</caption>
        <thead>
          <tr className="border-b border-line-strong text-ink-soft">
            <th scope="col" className="py-1 text-right">Line</th>
            <th scope="col" className="pl-3">Column</th>
            <th scope="col">Reason</th>
          </tr>
        </thead>
        <tbody>
          {report.map((p, i) => (
            <tr key={`${p.line}-${p.column}-${i}`} className="border-b border-line">
              <td className="num py-1 text-right">{p.line}</td>
              <td className="pl-3 font-mono text-xs">{p.column}</td>
              <td>{p.reason}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** The CSV file field of an import (labelled; as wide as a phone's card allows). */
export function CsvFileField({ inputRef, onFile }: { inputRef: RefObject<HTMLInputElement | null>; onFile: (file: File | null) => void }) {
  const id = useId();
  return (
    // min-w-0 and w-full: a file field's own width (its button and "No file chosen") is wider than a phone's card.
    <div className="flex w-full min-w-0 flex-col gap-1 sm:w-auto">
      <label htmlFor={id} className="text-sm font-bold">CSV file</label>
      <input
        ref={inputRef}
        id={id}
        type="file"
        accept=".csv,text/csv"
        onChange={(e) => onFile(e.target.files?.[0] ?? null)}
        className="min-h-11 w-full min-w-0 rounded-lg border border-line-strong bg-paper-card px-3 py-2 text-sm"
      />
    </div>
  );
}

interface UploadHandlers<R> {
  onSuccess: (result: R) => void;
  onError: (err: unknown) => void;
}

/**
 * An import's file and what became of it: the chosen file, the refusal's message and row report. `start` sends the
 * file (or says to choose one first); when it lands, `onDone` runs and the file field is cleared for the next file.
 */
export function useCsvUpload<R>() {
  const fileRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [report, setReport] = useState<ImportProblem[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const start = (send: (file: File, handlers: UploadHandlers<R>) => void, onDone: (result: R) => void) => {
    setReport(null);
    setError(null);
    if (!file) {
      setError('Choose a CSV file first');
      return;
    }
    send(file, {
      onSuccess: (result) => {
        onDone(result);
        setFile(null);
        if (fileRef.current) fileRef.current.value = '';
      },
      onError: (err) => {
        const rows = err instanceof ApiError ? (err.problem as { report?: ImportProblem[] }).report : undefined;
        setError(errorMessage(err));
        if (rows) setReport(rows);
      },
    });
  };
  return { fileRef, setFile, report, error, start };
}
