import { useNavigate } from 'react-router-dom';
import { TrayEditor } from '@/features/trays/components/tray-editor';
import { useCreateTray } from '@/features/trays/api/use-tray-mutations';
import { PageHeader } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useUnsavedGuard } from '@/lib/use-unsaved-guard';

export function Component() {
  const create = useCreateTray();
  const navigate = useNavigate();
  const guard = useUnsavedGuard();
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="New base tray" lead="One recipe, one pan, a cut plan. The numbers update as you type." />
      <TrayEditor
        busy={create.isPending}
        onSave={(values) => create.mutateAsync(values)}
        onDirtyChange={guard.onDirtyChange}
        onSaved={(tray) => {
          guard.allow();
          navigate(paths.tray(tray.id), { replace: true });
        }}
      />
    </div>
  );
}
