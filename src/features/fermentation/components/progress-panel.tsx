import { ABV_EXACT_LABEL, ABV_SIMPLE_LABEL } from '@shared/fermentation';
import { formatAbv, formatFraction } from '@shared/brewmath';
import type { FermentationProgress } from '@shared/schemas/fermentation';
import { useUnits } from '@/lib/units';

/** Apparent attenuation and ABV so far, beside the recipe's targets, with each ABV formula named. */
export function ProgressPanel({ progress }: { progress: FermentationProgress }) {
  const units = useUnits();
  const { current, target } = progress;
  return (
    <div className="space-y-3">
      <div className="overflow-hidden rounded-lg ring-1 ring-cellar-100">
        <table className="w-full text-left text-sm">
          <thead className="bg-cellar-50 text-ink-soft">
            <tr>
              <th scope="col" className="p-2 font-semibold">
                <span className="sr-only">Figure</span>
              </th>
              <th scope="col" className="p-2 font-semibold">
                Now{current?.estimate ? ' (estimate)' : ''}
              </th>
              <th scope="col" className="p-2 font-semibold">
                Recipe target
              </th>
            </tr>
          </thead>
          <tbody className="tabular-nums">
            <Row label={progress.ogSource === 'measured' ? 'OG (measured)' : 'OG (recipe target)'} now={units.format('gravity', progress.og)} target={units.format('gravity', target?.og)} />
            <Row label="Gravity" now={current ? units.format('gravity', current.sg) : '—'} target={target ? `${units.format('gravity', target.fg)} FG` : '—'} />
            <Row label="Apparent attenuation" now={current ? formatFraction(current.apparentAttenuation) : '—'} target={target ? formatFraction(target.apparentAttenuation) : '—'} />
            <Row label={ABV_SIMPLE_LABEL} now={current ? formatAbv(current.abvSimple) : '—'} target={target ? formatAbv(target.abvSimple) : '—'} strong />
            <Row label={ABV_EXACT_LABEL} now={current ? formatAbv(current.abvExact) : '—'} target={target ? formatAbv(target.abvExact) : '—'} />
          </tbody>
        </table>
      </div>
      {progress.note && <p className="text-sm text-ink-soft">{progress.note}</p>}
      <p className="text-xs text-ink-faint">
        “Now” uses the latest gravity reading; the ABV is final only once the gravity is stable. Apparent attenuation is (OG − gravity) ÷ (OG − 1).
      </p>
    </div>
  );
}

function Row({ label, now, target, strong = false }: { label: string; now: string; target: string; strong?: boolean }) {
  return (
    <tr className="border-t border-cellar-100 align-top">
      <th scope="row" className="p-2 font-normal text-ink-soft">
        {label}
      </th>
      <td className={`p-2 ${strong ? 'text-lg font-bold text-cellar-900' : 'font-semibold'}`}>{now}</td>
      <td className="p-2">{target}</td>
    </tr>
  );
}
