import { useId, useRef, useState } from 'react';
import { toast } from 'sonner';
import { IMPORT_COLUMNS, type ImportProblem } from '@shared/schemas/ingredients.schema';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { ApiError, errorMessage } from '@/lib/problem';
import { useImportIngredients } from '../api/use-ingredient-mutations';
import { counted } from '@/lib/words';

const EXAMPLE_ROW = [
  'Basil pesto (example)', 'condiments', '450', '45', '7', '5', '6', '2', '3', '0', '0', '0', '700', '0.95', '',
  'tree-nuts; milk', '6.7', 'oz', '6.7 oz jar', '549', 'condiments', 'package label', '',
];

function templateHref(): string {
  const quote = (c: string) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c);
  const csv = `${IMPORT_COLUMNS.join(',')}\n${EXAMPLE_ROW.map(quote).join(',')}\n`;
  return `data:text/csv;charset=utf-8,${encodeURIComponent(csv)}`;
}

/** CSV upload of workspace-own ingredients; a refused file shows its row report as a table. */
export function IngredientImport() {
  const inputId = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [report, setReport] = useState<ImportProblem[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const upload = useImportIngredients();

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    setReport(null);
    setError(null);
    if (!file) {
      setError('Choose a CSV file first');
      return;
    }
    upload.mutate(file, {
      onSuccess: (res) => {
        toast.success(`Imported ${counted(res.created, 'ingredient')}`);
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

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-soft">
        One ingredient per row, values per 100 g. Every row is checked first: if any row has a problem, nothing is saved
        and the problems are listed by line. Commas, semicolons or tabs between the columns (as the header line has them),
        and a decimal comma or point. Up to 1 MB.{' '}
        <a href={templateHref()} download="trayline-ingredients-template.csv" className="font-bold underline">
          Download a template
        </a>
        .
      </p>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
        {/* min-w-0 and w-full: a file field's own width (its button and "No file chosen") is wider than a phone's card. */}
        <div className="flex w-full min-w-0 flex-col gap-1 sm:w-auto">
          <label htmlFor={inputId} className="text-sm font-bold">CSV file</label>
          <input
            ref={fileRef}
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => setFile(e.target.files?.[0] ?? null)}
            className="min-h-11 w-full min-w-0 rounded-lg border border-line-strong bg-paper-card px-3 py-2 text-sm"
          />
        </div>
        <Button type="submit" variant="secondary" busy={upload.isPending}>
          Import
        </Button>
      </form>
      {error && <Notice tone="block" title={error} />}
      {report && report.length > 0 && (
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
      )}
    </div>
  );
}
