/**
 * The public late-boil check as a page body: no account needed. It is rendered by the app's
 * `/late-boil-check` route and by the check's own small page (src/public-check.tsx, decision
 * 0026), which differ only in how a link is followed: through the router, or as a plain link.
 */
import { useState } from 'react';
import type { GravityUnit, UnitSystem } from '@shared/brewmath';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page';
import { SegmentedControl } from '@/components/ui/segmented-control';
import type { PageLink } from '@/components/ui/site-frame';
import { useMe } from '@/lib/auth';
import { unitsFor, useUnits, type UnitPrefs } from '@/lib/units';
import type { LateBoilInitialValues } from './form-values';
import { LateBoilCheck } from './late-boil-check';

const storageKey = 'wortwise.visitor-units';

/** A visitor's units: what they chose here before, else a guess from the browser's language. */
function visitorPrefs(): UnitPrefs {
  try {
    const saved = JSON.parse(localStorage.getItem(storageKey) ?? 'null') as Partial<UnitPrefs> | null;
    if (saved && (saved.unitSystem === 'metric' || saved.unitSystem === 'us') && (saved.gravityUnit === 'sg' || saved.gravityUnit === 'plato')) {
      return { unitSystem: saved.unitSystem, gravityUnit: saved.gravityUnit };
    }
  } catch {
    // Private browsing or a malformed entry: fall through to the guess.
  }
  return { unitSystem: typeof navigator !== 'undefined' && navigator.language === 'en-US' ? 'us' : 'metric', gravityUnit: 'sg' };
}

/** A made-up brew to try the check with: 26 L at 11.4 °Brix, ten minutes left, aiming for 1.050 and 23 L. */
const example: LateBoilInitialValues = {
  reading: { kind: 'refractometer', brix: 11.4, wcf: 1.04 },
  volumeL: 26,
  minutesLeft: 10,
  boilOffLPerHour: 4,
  targetSg: 1.05,
  targetVolumeL: 23,
};

/** Shown to a visitor in place of the "Choose this" buttons. */
export function SignUpNudge({ Link }: { Link: PageLink }) {
  return (
    <p className="rounded-xl bg-malt-50 p-4 text-malt-700">
      <Link to="/sign-up" className="font-semibold underline">
        Sign up to keep a log of your brew days
      </Link>{' '}
      — every reading and every choice, with its reasons, for you and your mentor.
    </p>
  );
}

export function PublicCheck({ Link }: { Link: PageLink }) {
  const { data: me } = useMe();
  const signedInUnits = useUnits();
  const [prefs, setPrefs] = useState<UnitPrefs>(visitorPrefs);
  const [preset, setPreset] = useState<{ key: number; values?: LateBoilInitialValues }>({ key: 0 });
  const units = me ? signedInUnits : unitsFor(prefs);

  function choose(next: Partial<UnitPrefs>) {
    const merged = { ...prefs, ...next };
    setPrefs(merged);
    try {
      localStorage.setItem(storageKey, JSON.stringify(merged));
    } catch {
      // Not saved for next time; this visit still uses it.
    }
  }

  return (
    <>
      <PageHeader
        title="Late-boil check"
        subtitle="About ten minutes before the end of the boil, enter a reading: see what to add, or how long to keep boiling, to hit your target OG."
        actions={
          <Button variant="secondary" onClick={() => setPreset((p) => ({ key: p.key + 1, values: example }))}>
            Fill in an example
          </Button>
        }
      />
      {!me && (
        <div className="mb-4 flex flex-wrap gap-2">
          <SegmentedControl<UnitSystem> label="Units" value={prefs.unitSystem} options={[['metric', 'Litres, kg'], ['us', 'Gallons, lb']]} onChange={(unitSystem) => choose({ unitSystem })} />
          <SegmentedControl<GravityUnit> label="Gravity" value={prefs.gravityUnit} options={[['sg', 'SG'], ['plato', '°Plato']]} onChange={(gravityUnit) => choose({ gravityUnit })} />
        </div>
      )}
      <LateBoilCheck
        key={preset.key}
        initialValues={preset.values}
        units={units}
        nudge={
          me ? (
            <p className="rounded-xl bg-cellar-50 p-4 text-cellar-900">To keep a choice in your log, run this check from a brew day: it fills in the recipe's targets for you.</p>
          ) : (
            <SignUpNudge Link={Link} />
          )
        }
      />
    </>
  );
}
