/**
 * The whole fermentation log as our CSV (docs/fermentation-csv.md): the columns the import reads,
 * then three for people (corrected value, estimate, source) that the import ignores. Values are
 * written at the precision the duplicate check uses, so importing an export adds nothing.
 */
import { CSV_COLUMNS, CSV_EXPORT_EXTRA_COLUMNS, roundFor } from '@shared/fermentation';
import type { FermentationRaw } from '@shared/schemas/fermentation';
import type { Actor } from '../auth/permissions';
import { loadBrewForActor } from '../brews/service';
import type { Db } from '../db/client';
import { formulaSafe, writeCsv, type CsvCell } from '../lib/csv';
import { readingRows } from './service';

function valueAndUnit(raw: FermentationRaw): { value: string; unit: string; sample: string; original: string } {
  switch (raw.method) {
    case 'hydrometer':
      return { value: roundFor('sg', raw.sg), unit: 'sg', sample: raw.sampleTempC === null ? '' : roundFor('c', raw.sampleTempC), original: '' };
    case 'refractometer':
      return { value: roundFor('brix', raw.brix), unit: 'brix', sample: '', original: roundFor('brix', raw.originalBrix) };
    case 'thermometer':
      return { value: roundFor('c', raw.tempC), unit: 'c', sample: '', original: '' };
  }
}

export async function exportCsv(db: Db, actor: Actor, brewId: number): Promise<{ filename: string; body: string }> {
  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  const rows = await readingRows(db, brewId);
  const lines: CsvCell[][] = [[...CSV_COLUMNS, ...CSV_EXPORT_EXTRA_COLUMNS]];
  for (const r of rows) {
    const raw = r.raw;
    const { value, unit, sample, original } = valueAndUnit(raw);
    const snapshot: { name?: string } = r.instrumentSnapshot;
    lines.push(
      [
        r.takenAt.toISOString(),
        r.kind,
        value,
        unit,
        sample,
        original,
        // The common-practice stand-ins have no saved instrument to name.
        r.instrumentId === null ? '' : formulaSafe(snapshot.name ?? ''),
        formulaSafe(r.note),
        r.kind === 'gravity' ? r.correctedValue.toFixed(4) : r.correctedValue.toFixed(2),
        r.estimate ? 'yes' : 'no',
        r.source,
      ],
    );
  }
  const slug = stored.row.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'brew';
  return { filename: `${slug}-fermentation.csv`, body: writeCsv(lines) };
}
