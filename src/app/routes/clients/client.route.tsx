import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import type { UseFormSetError } from 'react-hook-form';
import type { ClientDto, CreateClientData, CreateClientInput } from '@shared/schemas/clients.schema';
import { clientQuery } from '@/features/clients/api/clients.queries';
import { useDeleteClient, useInviteClient, useUpdateClient } from '@/features/clients/api/use-client-mutations';
import { ClientForm, clientToInput } from '@/features/clients/components/client-form';
import { PublishedAllergens } from '@/features/clients/components/published-allergens';
import { DeliveryLog } from '@/features/mail/components/delivery-log';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card, ErrorState, Notice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { NewerVersionNotice, StaleEditNotice } from '@/components/ui/stale-edit-notice';
import { useEditBase } from '@/lib/use-edit-base';
import { Cautions } from '@/components/domain/cautions';
import { applyServerErrors } from '@/lib/form-errors';
import { errorMessage, isApiError, markShown, reasonOf } from '@/lib/problem';
import { paths } from '@/config/paths';
import { DemoNotice } from '@/features/auth/components/demo-notice';
import { useMe } from '@/features/auth/hooks/use-me';
import { dateWithYearLabel, instantDayLabel } from '@/lib/dates';
import { useFollowedText } from '@/lib/use-followed-text';
import { useTellBoth, useUnsavedGuard } from '@/lib/use-unsaved-guard';

/** What archiving a client does, said where the coach archives and on an archived profile. */
const ARCHIVE_MEANS =
  'An archived client leaves the client list and the boards of weeks without their plates, and copied weeks leave them out; past weeks and the plans they were sent keep them. Restore them any time.';

function InviteCard({ client }: { client: ClientDto }) {
  const invite = useInviteClient(client.id);
  // The profile's e-mail, saved since this page opened (the form above, someone else), shows here unless one is typed.
  const [email, setEmail] = useFollowedText(client.email ?? '');
  const [link, setLink] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  if (client.archivedAt && !client.account) {
    return (
      <Card>
        <h2 className="mb-2 text-xl">Invite to “My plates”</h2>
        <p>Restore {client.name} to invite them.</p>
      </Card>
    );
  }
  if (client.account) {
    return (
      <Card>
        <h2 className="mb-2 text-xl">Client account</h2>
        <p>
          {client.account.name} ({client.account.email}) signs in to see their plates and targets.
        </p>
      </Card>
    );
  }
  return (
    <Card>
      <h2 className="mb-2 text-xl">Invite to “My plates”</h2>
      {client.invitation && !link && (
        <p className="mb-3 text-sm">
          Invited <strong>{client.invitation.email}</strong>; not joined yet. The link works until{' '}
          {instantDayLabel(client.invitation.expiresAt, true)}. Invite again
          to send a new link.
        </p>
      )}
      <form
        className="grid gap-3 sm:grid-cols-[1fr_auto] sm:items-end"
        onSubmit={(e) => {
          e.preventDefault();
          setError(null);
          invite.mutate(email, {
            onSuccess: (inv) => setLink(inv.link ?? null),
            onError: (err) => {
              markShown(err);
              setError(reasonOf(err));
            },
          });
        }}
      >
        <TextField label="E-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} error={error ?? undefined} />
        <Button type="submit" busy={invite.isPending}>
          Invite
        </Button>
      </form>
      {link && (
        <div className="mt-3">
          <Notice tone="info" title="Invitation link (valid 14 days)">
            <input readOnly aria-label="Invitation link" value={link} className="mt-2 w-full rounded border border-line-strong bg-paper px-2 py-1 font-mono text-sm" onFocus={(e) => e.currentTarget.select()} />
          </Notice>
        </div>
      )}
    </Card>
  );
}

export function Component() {
  const id = Number(useParams().clientId);
  const q = useQuery(clientQuery(id));
  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  // Keyed by the client: another client's profile on the same route starts an edit state of its own.
  return <ClientProfile key={id} client={q.data as ClientDto} refetch={() => void q.refetch()} />;
}

function ClientProfile({ client, refetch }: { client: ClientDto; refetch: () => void }) {
  const id = client.id;
  const me = useMe();
  const update = useUpdateClient(id);
  const del = useDeleteClient();
  const navigate = useNavigate();
  const [formError, setFormError] = useState<string | null>(null);
  // Archive or restore refused because the profile changed meanwhile: the page shows the other version.
  const [stale, setStale] = useState(false);
  // The version the form's typing started from: a save refused because someone else saved meanwhile keeps what was
  // typed until the coach reloads theirs or saves this over it; archiving keeps it too.
  const edit = useEditBase<ClientDto, CreateClientData>(client);
  const guard = useUnsavedGuard();
  const onDirtyChange = useTellBoth(edit.onDirtyChange, guard.onDirtyChange);
  const [archiveError, setArchiveError] = useState<string | null>(null);
  const slots = Object.keys(client.targets.slots);
  const onStale = () => {
    setStale(true);
    refetch();
  };
  const save = (values: CreateClientData, version: number, setError?: UseFormSetError<CreateClientInput>) => {
    setFormError(null);
    setStale(false);
    update.mutate(
      { ...values, version },
      {
        onSuccess: edit.saved,
        onError: (e) => {
          markShown(e);
          if (isApiError(e, 409) && e.problem.code === 'stale_version') {
            edit.refused(values, (e.problem.current as ClientDto | undefined) ?? client);
            refetch();
            return;
          }
          setFormError(setError ? applyServerErrors(e, setError, values) : errorMessage(e));
        },
      },
    );
  };
  const setArchived = (archived: boolean) => {
    setArchiveError(null);
    setStale(false);
    const before = client.version;
    edit.carrying(before);
    update.mutate(
      { archived, version: before },
      {
        onSettled: (after) => edit.carried(before, after ?? null),
        onError: (e) => {
          markShown(e);
          if (isApiError(e, 409)) onStale();
          else setArchiveError(errorMessage(e));
        },
      },
    );
  };
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title={client.name} lead={`Daily targets: ${client.targets.targetKcal} kcal · net carbs ≤ ${client.targets.netCarbCapG} g · protein ${client.targets.proteinG} g · fat ${client.targets.fatG} g`}>
        {client.archivedAt ? (
          <Button variant="secondary" busy={update.isPending} onClick={() => setArchived(false)}>
            Restore
          </Button>
        ) : (
          <Button
            variant="secondary"
            busy={update.isPending}
            onClick={() => {
              if (window.confirm(`Archive ${client.name}? ${ARCHIVE_MEANS}`)) setArchived(true);
            }}
          >
            Archive
          </Button>
        )}
        <Button
          variant="danger"
          busy={del.isPending}
          onClick={() => {
            const ask = `Delete ${client.name} for good? Their plates on every week board go too.${client.archivedAt ? '' : ' To keep their history, archive them instead.'}`;
            if (window.confirm(ask))
              del.mutate(id, {
                onSuccess: () => {
                  guard.allow();
                  navigate(paths.clients);
                },
              });
          }}
        >
          Delete
        </Button>
      </PageHeader>
      {client.archivedAt && (
        <Notice tone="info" title={`Archived on ${dateWithYearLabel(client.archivedAt)}`}>
          {ARCHIVE_MEANS}
          {client.account && (
            <p className="mt-2">
              {client.name} can still sign in ({client.account.email}) and see the weeks they are on. To end that, remove their access on the{' '}
              <Link to={paths.team} className="underline">
                Team page
              </Link>
              .
            </p>
          )}
        </Notice>
      )}
      {archiveError && (
        <Notice tone="block" title="Not changed">
          {archiveError}
        </Notice>
      )}
      <PublishedAllergens clientId={client.id} name={client.name} />
      <DemoNotice>An invented demo client: measurements, targets and notes are made up and are not advice.</DemoNotice>
      {stale && (
        <Notice tone="warn" title="Someone else changed this profile">
          The page now shows their version; archive or restore again if you still mean to.
        </Notice>
      )}
      {edit.held ? (
        <StaleEditNotice
          what="profile"
          version={edit.held.current.version}
          busy={update.isPending}
          onReload={edit.reload}
          onKeep={() => edit.held && save(edit.held.values, edit.held.current.version)}
        />
      ) : (
        edit.newerElsewhere && <NewerVersionNotice what="profile" version={edit.newerElsewhere.version} onReload={edit.reload} />
      )}
      <Card>
        <ClientForm
          unitSystem={me.unitSystem}
          key={edit.base.version}
          initial={clientToInput(edit.base)}
          onDirtyChange={onDirtyChange}
          slots={slots}
          submitLabel="Save changes"
          busy={update.isPending}
          formError={formError}
          onSubmit={(values, setError) => save(values, edit.sendVersion, setError)}
        />
      </Card>
      <Card>
        <h2 className="mb-2 text-xl">Per meal slot</h2>
        <ul className="grid gap-2 sm:grid-cols-3">
          {Object.entries(client.targets.slots).map(([slot, t]) => (
            <li key={slot} className="rounded-lg bg-paper p-3">
              <p className="font-bold capitalize">
                {slot} <span className="num text-sm text-ink-faint">({Math.round(t.share * 100)} %)</span>
              </p>
              <p className="num text-sm">
                {t.targetKcal} kcal · ≤ {t.netCarbCapG} g net carbs · {t.proteinG} g protein
              </p>
            </li>
          ))}
        </ul>
      </Card>
      <InviteCard client={client} />
      <Card>
        <h2 className="mb-3 text-xl">Plans sent</h2>
        <DeliveryLog clientId={client.id} />
      </Card>
      <Cautions topic="diet" compact />
    </div>
  );
}
