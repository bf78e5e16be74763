import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { isApiError } from '@/lib/problem';

/** The end of the bake-rule and oven forms: a stale-save notice, the form's own error, save and cancel. */
export function FormFooter(props: { saveLabel: string; error: unknown; rootError?: string; busy: boolean; onCancel: () => void }) {
  return (
    <>
      {isApiError(props.error, 409) && (
        <Notice tone="warn" title="Not saved">
          {props.error.message}. Close this form to see the current values.
        </Notice>
      )}
      {props.rootError && <Notice tone="block">{props.rootError}</Notice>}
      <div className="flex gap-2">
        <Button type="submit" busy={props.busy}>
          {props.saveLabel}
        </Button>
        <Button type="button" variant="ghost" onClick={props.onCancel}>
          Cancel
        </Button>
      </div>
    </>
  );
}
