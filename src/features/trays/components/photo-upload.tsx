import { useRef } from 'react';
import type { TrayDto } from '@shared/schemas/trays.schema';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { errorMessage } from '@/lib/problem';
import { useUploadTrayPhoto } from '../api/use-tray-mutations';

/** Photo of a tray: JPEG, PNG or WebP up to 5 MB (the server checks the content, not the name). */
export function PhotoUpload({ tray, canEdit }: { tray: TrayDto; canEdit: boolean }) {
  const upload = useUploadTrayPhoto(tray.id);
  const input = useRef<HTMLInputElement>(null);
  return (
    <div className="flex flex-col gap-2">
      {tray.photo ? (
        <img src={tray.photo.url} alt={`Photo of ${tray.name}`} className="max-h-80 w-full rounded-tray object-cover" />
      ) : (
        <p className="text-sm text-ink-faint">No photo yet.</p>
      )}
      {canEdit && (
        <div className="no-print flex flex-col gap-2">
          <input
            ref={input}
            type="file"
            accept="image/jpeg,image/png,image/webp"
            className="sr-only"
            aria-label="Choose a photo"
            onChange={(e) => {
              const f = e.target.files?.[0];
              if (f) upload.mutate(f);
              e.target.value = '';
            }}
          />
          <Button type="button" variant="secondary" busy={upload.isPending} onClick={() => input.current?.click()}>
            {tray.photo ? 'Replace photo' : 'Add a photo'}
          </Button>
          <p className="text-xs text-ink-faint">JPEG, PNG or WebP, up to 5 MB.</p>
          {upload.isError && <Notice tone="block" title={errorMessage(upload.error)} />}
        </div>
      )}
    </div>
  );
}
