import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { useCreateIngredient } from '@/features/ingredients/api/use-ingredient-mutations';
import { EMPTY_INGREDIENT, IngredientForm } from '@/features/ingredients/components/ingredient-form';
import { PageHeader } from '@/components/ui/states';
import { paths } from '@/config/paths';

export function Component() {
  const create = useCreateIngredient();
  const navigate = useNavigate();
  return (
    <div className="flex max-w-4xl flex-col gap-6">
      <PageHeader title="New ingredient" lead="Values per 100 g, as on a US label or a food-composition table." />
      <IngredientForm
        initial={EMPTY_INGREDIENT}
        submitLabel="Add to my library"
        busy={create.isPending}
        onSave={async (values) => {
          const dto = await create.mutateAsync(values);
          toast.success(`Added ${dto.name}`);
          navigate(paths.ingredient(dto.id));
        }}
      />
    </div>
  );
}
