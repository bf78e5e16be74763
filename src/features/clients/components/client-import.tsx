import { useState } from 'react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import { clientImportTemplate, type ClientImportResultDto } from '@shared/schemas/clients.schema';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { CsvFileField, csvTemplateHref, ImportReport, useCsvUpload } from '@/components/domain/csv-import';
import { agrees, counted } from '@/lib/words';
import { paths } from '@/config/paths';
import { useImportClients } from '../api/use-client-mutations';

type Units = 'us' | 'metric';

/** What the import added: the names (first few linked to their pages) and what is left to do. */
function Added({ result }: { result: ClientImportResultDto }) {
  const shown = result.ids.slice(0, 12);
  return (
    <Notice tone="info" title={`Added from the file: ${counted(result.created, 'client')}`}>
      <p>
        {shown.map((id, i) => (
          <span key={id}>
            {i > 0 && ', '}
            <Link className="underline" to={paths.client(id)}>
              {result.names[i]}
            </Link>
          </span>
        ))}
        {result.created > shown.length && `, and ${result.created - shown.length} more`}.
      </p>
      <p>
        {result.withEmail > 0
          ? `${result.withEmail} of them ${agrees(result.withEmail, 'has', 'have')} an e-mail address. The import sent no invitation: invite them all from above the list, or each from their page, when you are ready.`
          : 'The import sent no invitation: add an e-mail address on a client’s page to invite them.'}{' '}
        Check each profile’s targets before you plan their week.
      </p>
    </Notice>
  );
}

/** CSV upload of client profiles, for a coach who brings a list of clients from a spreadsheet. */
export function ClientImport({ units }: { units: Units }) {
  const csv = useCsvUpload<ClientImportResultDto>();
  const [added, setAdded] = useState<ClientImportResultDto | null>(null);
  const upload = useImportClients();
  const us = units === 'us';

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    setAdded(null);
    csv.start(
      (file, handlers) => upload.mutate({ file, units }, handlers),
      (res) => {
        toast.success(`Imported: ${counted(res.created, 'new client')}`);
        setAdded(res);
      },
    );
  };

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-2 text-sm text-ink-soft">
        <p>
          One client per row. Needed: name, sex, age, height, weight, activity and goal. Height and weight may carry their
          unit ({us ? '5 ft 6 in, 66 in, 168 cm; 163 lb, 74 kg' : '168 cm, 1.68 m, 5 ft 6 in; 74 kg, 163 lb'}); a number alone is
          read in your units ({us ? 'inches and pounds' : 'centimetres and kilograms'}). Activity: sedentary, light, moderate,
          active or very active; goal: lose, maintain or gain.
        </p>
        <p>
          Leave the four target columns blank and Trayline computes the targets, or fill all four to type them. Allergens:
          the nine major ones (milk, egg, fish, crustacean shellfish, tree nuts, peanuts, wheat, soy, sesame), separated by
          semicolons; other sensitivities go under dislikes. Health notes stay with you: clients do not see them.
        </p>
        <p>
          Every row is checked first: if any row has a problem, nothing is saved and the problems are listed by line. A
          name already among your clients is a problem (a file imported twice does not double anyone). No invitation is
          sent. Up to 500 clients, 1 MB.{' '}
          <a href={csvTemplateHref(...clientImportTemplate(units))} download="trayline-clients-template.csv" className="font-bold underline">
            Download a template
          </a>
          .
        </p>
      </div>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
        <CsvFileField inputRef={csv.fileRef} onFile={csv.setFile} />
        <Button type="submit" variant="secondary" busy={upload.isPending}>
          Import clients
        </Button>
      </form>
      {csv.error && <Notice tone="block" title={csv.error} />}
      {added && <Added result={added} />}
      {csv.report && csv.report.length > 0 && <ImportReport report={csv.report} />}
    </div>
  );
}
