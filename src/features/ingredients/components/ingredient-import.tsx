import { useId, useState } from 'react';
import { toast } from 'sonner';
import { IMPORT_COLUMNS, type ImportResultDto } from '@shared/schemas/ingredients.schema';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { useImportIngredients } from '../api/use-ingredient-mutations';
import { counted } from '@/lib/words';
import { andList } from '@shared/domain/words';
import { CsvFileField, csvTemplateHref, ImportReport, useCsvUpload } from '@/components/domain/csv-import';

const EXAMPLE_ROW = [
  'Basil pesto (example)', 'condiments', '450', '45', '7', '5', '6', '2', '3', '0', '0', '0', '700', '0.95', '',
  'tree-nuts; milk', '6.7', 'oz', '6.7 oz jar', '549', 'condiments', 'package label', '',
];

/** "2 new ingredients, 3 updated, 40 unchanged": what an import did, the parts it did only. */
export function importWords(res: ImportResultDto): string {
  const parts = [
    res.created > 0 && counted(res.created, 'new ingredient'),
    res.updated > 0 && `${res.updated} updated`,
    res.unchanged > 0 && `${res.unchanged} unchanged`,
  ].filter(Boolean);
  return parts.length ? `Imported: ${parts.join(', ')}` : 'Imported: nothing to change';
}

/** CSV upload of workspace-own ingredients; a refused file shows its row report as a table. */
export function IngredientImport() {
  const updateHintId = useId();
  const [updateExisting, setUpdateExisting] = useState(false);
  const csv = useCsvUpload<ImportResultDto>();
  // The last import's changes to the library's own rows, named (a toast's count does not say which).
  const [updated, setUpdated] = useState<string[]>([]);
  const upload = useImportIngredients();

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    setUpdated([]);
    csv.start(
      (file, handlers) => upload.mutate({ file, updateExisting }, handlers),
      (res) => {
        toast.success(importWords(res));
        setUpdated(res.updatedNames);
      },
    );
  };

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-soft">
        One ingredient per row, values per 100 g. Every row is checked first: if any row has a problem, nothing is saved
        and the problems are listed by line. Commas, semicolons or tabs between the columns (as the header line has them),
        and a decimal comma or point. Up to 1 MB.{' '}
        <a href={csvTemplateHref(IMPORT_COLUMNS, [EXAMPLE_ROW])} download="trayline-ingredients-template.csv" className="font-bold underline">
          Download a template
        </a>
        .
      </p>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
        <CsvFileField inputRef={csv.fileRef} onFile={csv.setFile} />
        {/* Chosen before pressing Import: the option comes first in reading and keyboard order. */}
        <div className="flex w-full flex-col gap-1">
          <label className="flex min-h-11 items-center gap-2 font-bold">
            <input
              type="checkbox"
              className="h-5 w-5 accent-herb"
              checked={updateExisting}
              onChange={(e) => setUpdateExisting(e.target.checked)}
              aria-describedby={updateHintId}
            />
            Update the ones already in my library
          </label>
          <p id={updateHintId} className="text-sm text-ink-soft">
            {updateExisting
              ? 'A row named like one of your ingredients gives it the file’s values, as an edit by hand would: the base trays and plates that use it count with them (a published week keeps what it was published with until you publish it again). A row that changes nothing leaves it as it is. The shared library is never changed.'
              : 'Not ticked: a row named like one of your ingredients is listed as a problem, and nothing is saved.'}
          </p>
        </div>
        <Button type="submit" variant="secondary" busy={upload.isPending}>
          Import
        </Button>
      </form>
      {csv.error && (
        <Notice tone="block" title={csv.error}>
          {!updateExisting && csv.report?.some((p) => p.code === 'name_taken') && (
            <p>
              To give the ingredients already in your library the file’s values, tick “Update the ones already in my library” and import again.
            </p>
          )}
        </Notice>
      )}
      {updated.length > 0 && (
        <Notice tone="info" title={`Updated from the file: ${counted(updated.length, 'ingredient')}`}>
          <p>{andList(updated.length > 12 ? [...updated.slice(0, 12), `${updated.length - 12} more`] : updated)}.</p>
        </Notice>
      )}
      {csv.report && csv.report.length > 0 && <ImportReport report={csv.report} />}
    </div>
  );
}
