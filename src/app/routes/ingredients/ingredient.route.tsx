import { useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from 'sonner';
import type { IngredientDto } from '@shared/schemas/ingredients.schema';
import { useMe } from '@/features/auth/hooks/use-me';
import { ingredientQuery } from '@/features/ingredients/api/ingredients.queries';
import { ingredientKeys } from '@/features/ingredients/api/ingredients.keys';
import { useCopyIngredient, useDeleteIngredient, useUpdateIngredient } from '@/features/ingredients/api/use-ingredient-mutations';
import { formValuesOf, IngredientForm } from '@/features/ingredients/components/ingredient-form';
import type { IngredientValues } from '@shared/schemas/ingredients.schema';
import { IngredientFacts } from '@/features/ingredients/components/ingredient-facts';
import { AtwaterFlag } from '@/features/ingredients/components/ingredient-bits';
import { Button } from '@/components/ui/button';
import { ErrorState, Notice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { NewerVersionNotice, StaleEditNotice } from '@/components/ui/stale-edit-notice';
import { useEditBase } from '@/lib/use-edit-base';
import { errorMessage, isApiError } from '@/lib/problem';
import { paths } from '@/config/paths';
import { useTellBoth, useUnsavedGuard } from '@/lib/use-unsaved-guard';

function EditOwn({ ingredient }: { ingredient: IngredientDto }) {
  const qc = useQueryClient();
  const navigate = useNavigate();
  const update = useUpdateIngredient(ingredient.id);
  const del = useDeleteIngredient();
  // The version the form's typing started from: a save refused because someone else saved the ingredient meanwhile
  // keeps what was typed (the form is not remounted) until the coach reloads their version or saves this over it.
  const edit = useEditBase<IngredientDto, IngredientValues>(ingredient);
  const guard = useUnsavedGuard();
  const onDirtyChange = useTellBoth(edit.onDirtyChange, guard.onDirtyChange);
  const [keepError, setKeepError] = useState<string | null>(null);
  const save = async (values: IngredientValues, version: number) => {
    setKeepError(null);
    try {
      edit.saved(await update.mutateAsync({ ...values, version }));
      toast.success('Saved');
    } catch (err) {
      if (isApiError(err, 409) && err.problem.code === 'stale_version') {
        const current = err.problem.current as IngredientDto | undefined;
        if (current) qc.setQueryData(ingredientKeys.detail(ingredient.id), current);
        else await qc.invalidateQueries({ queryKey: ingredientKeys.detail(ingredient.id) });
        edit.refused(values, current ?? ingredient);
        return;
      }
      throw err;
    }
  };
  const held = edit.held;
  return (
    <>
      <p>
        <AtwaterFlag check={ingredient.atwater} long />
      </p>
      {held ? (
        <StaleEditNotice
          what="ingredient"
          version={held.current.version}
          busy={update.isPending}
          onReload={edit.reload}
          onKeep={() => void save(held.values, held.current.version).catch((e: unknown) => setKeepError(errorMessage(e)))}
        />
      ) : (
        edit.newerElsewhere && <NewerVersionNotice what="ingredient" version={edit.newerElsewhere.version} onReload={edit.reload} />
      )}
      {keepError && <Notice tone="block" title={`Not saved: ${keepError}`} />}
      <IngredientForm
        key={`${ingredient.id}-${edit.base.version}`}
        initial={formValuesOf(edit.base)}
        submitLabel="Save changes"
        busy={update.isPending}
        onDirtyChange={onDirtyChange}
        // The form's own Save sends the version its typing started from (a 409 when someone else saved meanwhile).
        onSave={(values) => save(values, edit.sendVersion)}
      />
      <div className="border-t border-line pt-4">
        <Button
          variant="danger"
          busy={del.isPending}
          onClick={() => {
            if (!window.confirm(`Delete ${ingredient.name}? This cannot be undone.`)) return;
            del.mutate(ingredient.id, {
              onSuccess: () => {
                toast.success('Deleted');
                guard.allow();
                navigate(paths.ingredients);
              },
            });
          }}
        >
          Delete ingredient
        </Button>
        <p className="mt-1 text-sm text-ink-faint">An ingredient used by a base tray or a plate cannot be deleted.</p>
      </div>
    </>
  );
}

export function Component() {
  const me = useMe();
  const id = Number(useParams().ingredientId);
  const navigate = useNavigate();
  const detail = useQuery({ ...ingredientQuery(id), enabled: Number.isInteger(id) && id > 0 });
  const copy = useCopyIngredient();

  if (!Number.isInteger(id) || id <= 0) return <ErrorState error={new Error('Not an ingredient')} />;
  if (detail.isPending) return <PageSkeleton />;
  if (detail.isError) return <ErrorState error={detail.error} retry={() => detail.refetch()} />;
  const i = detail.data;
  return (
    <div className="flex max-w-5xl flex-col gap-6">
      <PageHeader title={i.name} lead={i.shared ? 'Shared library (read-only)' : 'Your library'}>
        {me.role === 'coach' && (
          <Button
            variant="secondary"
            busy={copy.isPending}
            onClick={() =>
              copy.mutate(i.id, {
                onSuccess: (dto) => {
                  toast.success(`Copied to your library as “${dto.name}”`);
                  navigate(paths.ingredient(dto.id));
                },
              })
            }
          >
            Copy to my library
          </Button>
        )}
      </PageHeader>
      {i.editable ? (
        // Keyed by the ingredient: "Copy to my library" opens the copy on the same route, with an edit state of its own.
        <EditOwn key={i.id} ingredient={i} />
      ) : (
        <>
          {i.shared && me.role === 'coach' && (
            <Notice tone="info">Shared ingredients are the same for every workspace. Copy one to your library to change it.</Notice>
          )}
          <IngredientFacts ingredient={i} />
        </>
      )}
    </div>
  );
}
