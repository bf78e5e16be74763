import { useQuery } from '@tanstack/react-query';
import { toast } from 'sonner';
import type { SignedInDeviceDto } from '@shared/schemas/auth.schema';
import { Button } from '@/components/ui/button';
import { QueryView, Skeleton } from '@/components/ui/states';
import { useRefusal } from '@/components/ui/refusal';
import { ActionList, ActionRow } from '@/components/ui/action-list';
import { momentLabel } from '@/lib/dates';
import { devicesQuery } from '../api/auth.queries';
import { useSignOutDevice, useSignOutOtherDevices } from '../api/use-auth-mutations';

/** Within two minutes of now reads as "active now" (the server keeps the last request's time to a minute). */
const NOW_MS = 2 * 60_000;

export function deviceName(d: Pick<SignedInDeviceDto, 'device'>): string {
  return d.device ?? 'A device signed in before Trayline noted devices';
}

export function lastActiveLabel(lastActiveAt: string, now = Date.now()): string {
  return now - Date.parse(lastActiveAt) < NOW_MS ? 'active now' : `last active ${momentLabel(lastActiveAt)}`;
}

/**
 * The devices signed in as this person, in every workspace they belong to (a phone left signed in, a shared kitchen
 * laptop): each with when it signed in and was last used, any other one signed out with a click, or all at once.
 */
export function SignedInDevices() {
  const list = useQuery(devicesQuery());
  const one = useSignOutDevice();
  const others = useSignOutOtherDevices();
  const refusal = useRefusal();
  return (
    <QueryView query={list} loading={<Skeleton className="h-20 w-full" label="Loading the devices signed in" />}>
      {(devices) => {
        const rest = devices.filter((d) => !d.current);
        return (
          <div className="flex flex-col gap-3">
            <ActionList label="Devices signed in as you">
              {devices.map((d) => (
                <ActionRow
                  key={d.id}
                  title={deviceName(d)}
                  aside={d.current && 'this device'}
                  detail={
                    <>
                      {d.signedInAt ? <>Signed in <span className="num">{momentLabel(d.signedInAt)}</span></> : 'Signed in earlier'}
                      {!d.current && <> · {lastActiveLabel(d.lastActiveAt)}</>}
                      {d.untilBrowserCloses && <> · until its browser closes</>}
                    </>
                  }
                  actions={
                    !d.current && (
                      <Button
                        size="sm"
                        variant="ghost"
                        busy={one.isPending && one.variables === d.id}
                        aria-label={`Sign out ${deviceName(d)}${d.signedInAt ? `, signed in ${momentLabel(d.signedInAt)}` : ''}`}
                        onClick={() => {
                          refusal.clear();
                          one.mutate(d.id, { onSuccess: () => toast.success(`${deviceName(d)} is signed out`), onError: refusal.say('That device was not signed out') });
                        }}
                      >
                        Sign out
                      </Button>
                    )
                  }
                />
              ))}
            </ActionList>
            {rest.length === 0 ? (
              <p className="text-sm text-ink-soft">You are signed in on this device only.</p>
            ) : (
              <Button
                variant="secondary"
                className="self-start"
                busy={others.isPending}
                onClick={() => {
                  if (!window.confirm(`Sign out ${rest.length === 1 ? 'the other device' : `the ${rest.length} other devices`}? Whoever uses ${rest.length === 1 ? 'it' : 'them'} must sign in again; this device stays signed in.`)) return;
                  refusal.clear();
                  others.mutate(undefined, {
                    onSuccess: (r) => toast.success(r.signedOut === 1 ? '1 other device signed out' : `${r.signedOut} other devices signed out`),
                    onError: refusal.say('The other devices were not signed out'),
                  });
                }}
              >
                Sign out everywhere else
              </Button>
            )}
            {refusal.notice}
          </div>
        );
      }}
    </QueryView>
  );
}
