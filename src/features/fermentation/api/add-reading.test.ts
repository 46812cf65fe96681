import { describe, expect, it } from 'vitest';
import type { FermentationLog, FermentationReading, FermentationReadingCreated } from '@shared/schemas/fermentation';
import { withFermentationReading } from './add-reading';

const reading = (id: number, takenAt: string) => ({ id, takenAt }) as FermentationReading;

/** Only the parts the merge touches; the rest of the log is carried over as it is. */
const log = {
  brew: { id: 7 },
  readings: [reading(1, '2026-03-02T10:00:00.000Z'), reading(3, '2026-03-04T10:00:00.000Z')],
  readingCount: 2,
  olderReadings: null,
  series: [reading(1, '2026-03-02T10:00:00.000Z'), reading(3, '2026-03-04T10:00:00.000Z')],
  verdict: { state: 'too-early' },
  temperature: { latest: null },
  progress: { og: 1.05 },
  packaging: null,
  remindersEnabled: true,
  reminders: [],
  now: '2026-03-04T11:00:00.000Z',
} as unknown as FermentationLog;

const created = (r: FermentationReading, duplicate = false) =>
  ({
    reading: r,
    duplicate,
    readingCount: duplicate ? 2 : 3,
    verdict: { state: 'moving' },
    temperature: { latest: { tempC: 19 } },
    progress: { og: 1.05, current: { sg: 1.012 } },
    reminders: [{ kind: 'recheck' }],
    now: '2026-03-05T11:00:00.000Z',
  }) as unknown as FermentationReadingCreated;

describe('adding a reading to the cached fermentation log', () => {
  it('puts a late-entered reading in time order and takes the verdict, summary, progress and reminders from the answer', () => {
    const next = withFermentationReading(log, created(reading(4, '2026-03-03T10:00:00.000Z')));
    expect(next.readings.map((r) => r.id)).toEqual([1, 4, 3]);
    expect(next.series.map((p) => p.id)).toEqual([1, 4, 3]);
    expect(next.readingCount).toBe(3);
    expect(next.verdict).toEqual({ state: 'moving' });
    expect(next.temperature).toEqual({ latest: { tempC: 19 } });
    expect(next.progress).toEqual({ og: 1.05, current: { sg: 1.012 } });
    expect(next.reminders).toEqual([{ kind: 'recheck' }]);
    expect(next.now).toBe('2026-03-05T11:00:00.000Z');
    expect(next.brew).toBe(log.brew);
    expect(log.readings).toHaveLength(2);
  });

  it('keeps a retried reading once', () => {
    const next = withFermentationReading(log, created(reading(3, '2026-03-04T10:00:00.000Z'), true));
    expect(next.readings.map((r) => r.id)).toEqual([1, 3]);
    expect(next.series.map((p) => p.id)).toEqual([1, 3]);
    expect(next.readingCount).toBe(2);
  });
});
