import { useMe } from '@/lib/auth';
import { Card, PageHeader } from '@/components/ui/page';

export function Component() {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <>
      <PageHeader title={`Welcome back, ${me.displayName}`} subtitle="Your brewing at a glance." />
      <div className="grid gap-4 sm:grid-cols-2">
        <Card>
          <h2 className="text-lg font-semibold text-cellar-900">Your clubs</h2>
          {me.clubs.length === 0 ? (
            <p className="mt-2 text-ink-soft">You are not in a club yet. An organiser can invite you by e-mail.</p>
          ) : (
            <ul className="mt-2 space-y-1">
              {me.clubs.map((c) => (
                <li key={c.id} className="flex justify-between gap-2">
                  <span>{c.name}</span>
                  <span className="text-sm capitalize text-ink-faint">{c.role}</span>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card>
          <h2 className="text-lg font-semibold text-cellar-900">Units</h2>
          <p className="mt-2 text-ink-soft">
            Showing {me.unitSystem === 'us' ? 'US units (gallons, pounds, °F)' : 'metric units (litres, kilograms, °C)'} and gravity as{' '}
            {me.gravityUnit === 'plato' ? 'degrees Plato' : 'specific gravity'}. Change this in the account menu.
          </p>
        </Card>
      </div>
    </>
  );
}
