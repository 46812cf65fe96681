import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { Figure } from './figure';

describe('Figure', () => {
  it('pairs its label and value as a term and its definition', () => {
    render(
      <dl>
        <Figure label="Target OG" value="1.050" hint="from the recipe" valueTestId="og" />
      </dl>,
    );
    const term = screen.getByRole('term');
    expect(term).toHaveTextContent('Target OG');
    const definitions = screen.getAllByRole('definition');
    expect(definitions.map((d) => d.textContent)).toEqual(['1.050', 'from the recipe']);
    expect(screen.getByTestId('og')).toHaveTextContent('1.050');
    // Term and value share one group, so they are read together.
    expect(within(term.parentElement!).getByText('1.050')).toBeInTheDocument();
  });

  it('reads as a phrase in a line of text', () => {
    render(
      <dl>
        <Figure inline label="Since pitching" value="6 days" />
      </dl>,
    );
    expect(screen.getByRole('term')).toHaveTextContent('Since pitching:');
    expect(screen.getByRole('definition')).toHaveTextContent('6 days');
    expect(screen.queryByText('6 days')?.closest('div')).toHaveTextContent('Since pitching: 6 days');
  });

  it('leaves out the hint when there is none', () => {
    render(
      <dl>
        <Figure label="Pairs" value={3} />
      </dl>,
    );
    expect(screen.getAllByRole('definition')).toHaveLength(1);
  });
});
