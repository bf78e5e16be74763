import { Navigate } from 'react-router-dom';
import { useMe } from '@/features/auth/hooks/use-me';
import { Card, PageHeader } from '@/components/ui/states';
import { Cautions } from '@/components/domain/cautions';
import { TileLink } from '@/components/ui/tile-link';
import { NAV } from '@/app/nav';
import { paths } from '@/config/paths';
import { WeekGlance } from '@/features/weeks/components/week-glance';
import { KitchenGlance } from '@/features/shopping/components/kitchen-glance';
import { FirstSteps } from './first-steps';

export function Component() {
  const me = useMe();
  if (me.role === 'client' && NAV.some((n) => n.to === paths.myPlates)) return <Navigate to={paths.myPlates} replace />;
  const links = NAV.filter((n) => n.roles.includes(me.role) && n.to !== paths.home);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title={`Hello, ${me.name.split(' ')[0]}`} tabTitle="This week" lead={me.workspaceName} />
      {me.role === 'coach' && <FirstSteps />}
      {me.role === 'coach' && <WeekGlance />}
      {me.role === 'assistant' && <KitchenGlance />}
      <Card>
        <h2 className="mb-3 text-xl">Where to go</h2>
        <ul className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
          {links.map((l) => (
            <li key={l.to}>
              <TileLink to={l.to} label={l.label} />
            </li>
          ))}
        </ul>
      </Card>
      <Cautions />
    </div>
  );
}
