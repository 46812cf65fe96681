import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { BrewReading } from '@shared/schemas/brews';
import { SouringProgress } from './souring-progress';

function souring(id: number, ph: number, takenAt: string): BrewReading {
  return {
    id,
    brewId: 1,
    stage: 'souring',
    kind: 'souring_ph',
    quantity: 'ph',
    instrumentId: null,
    instrument: null,
    raw: { ph },
    corrected: ph,
    correction: null,
    warnings: [],
    volumeL: null,
    takenAt,
    note: '',
    recomputedAt: null,
    recomputedFrom: null,
    photos: [],
  };
}

// Target pH 3.4, "reached" at or below it (common practice about 3.2 to 3.6 before the boil, no
// source). Hours worked by hand: 08:00 → 20:30 is 12.5 h, 08:00 → 08:00 next day is 24 h.
describe('SouringProgress', () => {
  it('shows hours since the first reading and which readings reached the target', () => {
    render(
      <SouringProgress
        targetPh={3.4}
        readings={[souring(2, 3.62, '2026-06-01T20:30:00Z'), souring(1, 4.5, '2026-06-01T08:00:00Z'), souring(3, 3.4, '2026-06-02T08:00:00Z')]}
      />,
    );
    const items = within(screen.getByRole('list')).getAllByRole('listitem');
    expect(items.map((li) => li.textContent)).toEqual([
      expect.stringMatching(/^pH\s4\.50, first reading .*: above target$/),
      expect.stringMatching(/^pH\s3\.62, 12\.5 h after the first .*: above target$/),
      expect.stringMatching(/^pH\s3\.40, 24 h after the first .*: target reached$/),
    ]);
    expect(screen.getByText(/Target pH 3\.40 reached/)).toBeInTheDocument();
  });

  it('says to keep souring while every reading is above the target', () => {
    render(<SouringProgress targetPh={3.4} readings={[souring(1, 4.5, '2026-06-01T08:00:00Z'), souring(2, 3.41, '2026-06-01T20:00:00Z')]} />);
    expect(screen.getByText(/Not yet at pH 3\.40: keep souring/)).toBeInTheDocument();
    expect(screen.queryByText(/target reached/)).not.toBeInTheDocument();
  });

  it('asks for the first reading when there is none', () => {
    render(<SouringProgress targetPh={3.4} readings={[]} />);
    expect(screen.getByText(/No souring pH yet/)).toBeInTheDocument();
  });
});
