import { BookOpen, Flame, FlaskConical, Gauge } from 'lucide-react';
import { Link, useLocation } from 'react-router';
import { useBrews } from '@/features/brews/api/list-brews';
import { ButtonLink } from '@/components/ui/button-link';
import { Card, Loading, PageHeader } from '@/components/ui/page';
import { useMe } from '@/lib/auth';
import { useUnits } from '@/lib/units';

const statusWords: Record<string, string> = {
  planned: 'Planned',
  brewing: 'Brewing',
  fermenting: 'Fermenting',
  packaged: 'Packaged',
};

export function Component() {
  const { data: me } = useMe();
  const brews = useBrews({ scope: 'mine', pageSize: 3 });
  const units = useUnits();
  // Straight after creating an account it is a first visit; every later one is a return.
  const firstVisit = (useLocation().state as { firstVisit?: boolean } | null)?.firstVisit === true;
  if (!me) return null;
  const latest = brews.data?.items ?? [];
  return (
    <>
      <PageHeader
        title={`${firstVisit ? 'Welcome' : 'Welcome back'}, ${me.displayName}`}
        subtitle="Your brewing at a glance."
        actions={
          <ButtonLink to="/brews" variant="primary">
            <Flame aria-hidden className="size-5" /> Start a brew day
          </ButtonLink>
        }
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <Card className="sm:col-span-2">
          <h2 className="text-lg font-semibold text-cellar-900">Latest brew days</h2>
          {brews.isPending ? (
            <Loading />
          ) : latest.length === 0 ? (
            <p className="mt-2 text-ink-soft">No brew days yet. Start one from a recipe on brew day.</p>
          ) : (
            <ul className="mt-2 divide-y divide-cellar-100">
              {latest.map((b) => (
                <li key={b.id}>
                  <Link to={`/brews/${b.id}`} className="flex min-h-touch flex-wrap items-center justify-between gap-x-4 gap-y-1 py-2 hover:bg-cellar-50">
                    <span className="font-semibold text-cellar-900">{b.name}</span>
                    <span className="text-sm text-ink-soft">
                      {statusWords[b.status] ?? b.status} · {b.brewedOn} · OG {units.format('gravity', b.og)} of {units.format('gravity', b.targetOg)}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card>
          <h2 className="text-lg font-semibold text-cellar-900">Your clubs</h2>
          {me.clubs.length === 0 ? (
            <p className="mt-2 text-ink-soft">You are not in a club yet. An organiser can invite you by e-mail.</p>
          ) : (
            <ul className="mt-2 space-y-1">
              {me.clubs.map((c) => (
                <li key={c.id}>
                  <Link to={`/clubs/${c.id}`} className="flex min-h-touch items-center justify-between gap-2 hover:underline">
                    <span>{c.name}</span>
                    <span className="text-sm capitalize text-ink-faint">{c.role}</span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card>
          <h2 className="text-lg font-semibold text-cellar-900">Shortcuts</h2>
          <ul className="mt-2 space-y-1">
            <Shortcut to="/recipes" icon={BookOpen} label="Recipes and their targets" />
            <Shortcut to="/instruments" icon={Gauge} label="Calibrate an instrument" />
            <Shortcut to="/late-boil-check" icon={FlaskConical} label="Late-boil check" />
          </ul>
          <p className="mt-3 text-sm text-ink-faint">
            Units: {me.unitSystem === 'us' ? 'US (gal, lb, °F)' : 'metric (L, kg, °C)'}, gravity as {me.gravityUnit === 'plato' ? '°Plato' : 'SG'}. Change them in
            the account menu.
          </p>
        </Card>
      </div>
    </>
  );
}

function Shortcut({ to, icon: Icon, label }: { to: string; icon: typeof Flame; label: string }) {
  return (
    <li>
      <Link to={to} className="flex min-h-touch items-center gap-2 font-semibold text-cellar-700 hover:underline">
        <Icon aria-hidden className="size-5" /> {label}
      </Link>
    </li>
  );
}
