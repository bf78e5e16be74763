import type { AssemblyInput, PlatePreviewInput } from '@shared/schemas/assemblies.schema';
import { Notice } from '@/components/ui/states';
import { ApiError } from '@/lib/problem';
import { useLivePreview } from '@/lib/use-live-preview';
import { usePlatePreview } from '../api/use-assembly-mutations';
import { PlateMacros } from './plate-macros';

/** The parts of the form that can be worked out: chosen trays with portions, add-ons with an ingredient and amount. */
export function previewParts(v: Pick<AssemblyInput, 'trays' | 'addOns'>): PlatePreviewInput | null {
  const trays = (v.trays ?? []).filter((t) => Number(t.trayId) > 0 && String(t.portions ?? '').trim() !== '');
  const addOns = (v.addOns ?? []).filter((a) => Number(a.ingredientId) > 0 && String(a.amountText ?? '').trim() !== '' && String(a.unit ?? '').trim() !== '');
  if (trays.length + addOns.length === 0) return null;
  return { trays, addOns };
}

/** What the plate being edited adds up to, worked out by the server as it will be once saved (debounced). */
export function PlatePreview({ parts }: { parts: PlatePreviewInput | null }) {
  const preview = usePlatePreview();
  useLivePreview(parts, preview);
  if (!parts) return <p className="text-sm text-ink-faint">Choose a base tray or an add-on to see what the plate adds up to.</p>;
  const problem = preview.error instanceof ApiError ? preview.error : null;
  const data = preview.data;
  // The add-ons as they were sent: the weights answer those, not what has been typed since.
  const sentAddOns = preview.variables?.addOns ?? [];
  return (
    <div aria-live="polite" aria-busy={preview.isPending} className="flex flex-col gap-2 rounded-lg bg-paper-deep p-3">
      <p className="text-xs font-bold uppercase text-ink-faint">This plate adds up to</p>
      {problem && (
        <Notice tone="warn" title="The numbers cannot be worked out yet">
          {Object.values(problem.fieldErrors).flat()[0] ?? problem.message}
        </Notice>
      )}
      {data && <PlateMacros macros={data.macros} allergens={data.allergens} />}
      {data && sentAddOns.length > 0 && data.addOnGrams.length === sentAddOns.length && (
        <p className="num text-sm text-ink-soft">
          Add-ons weigh:{' '}
          {sentAddOns
            .map((a, i) => `${String(a.amountText).trim()} ${String(a.unit).trim()} ≈ ${data.addOnGrams[i] === null ? '?' : `${data.addOnGrams[i]} g`}`)
            .join(' · ')}
        </p>
      )}
      {data && !data.complete && <p className="text-sm text-caution-700">A base tray on it has a line that cannot be weighed: its numbers are left out.</p>}
      {preview.isPending && !data && <p className="text-sm text-ink-faint">Working out the numbers…</p>}
    </div>
  );
}
