import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { useCreateIngredient } from '@/features/ingredients/api/use-ingredient-mutations';
import { EMPTY_INGREDIENT, IngredientForm } from '@/features/ingredients/components/ingredient-form';
import { PageHeader } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useUnsavedGuard } from '@/lib/use-unsaved-guard';

export function Component() {
  const create = useCreateIngredient();
  const navigate = useNavigate();
  const guard = useUnsavedGuard();
  return (
    <div className="flex max-w-4xl flex-col gap-6">
      <PageHeader title="New ingredient" lead="Values per 100 g, as on a US label or a food-composition table." />
      <IngredientForm
        initial={EMPTY_INGREDIENT}
        submitLabel="Add to my library"
        busy={create.isPending}
        onDirtyChange={guard.onDirtyChange}
        onSave={async (values) => {
          const dto = await create.mutateAsync(values);
          toast.success(`Added ${dto.name}`);
          guard.allow();
          navigate(paths.ingredient(dto.id));
        }}
      />
    </div>
  );
}
