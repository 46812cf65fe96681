import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { SegmentedControl } from './segmented-control';

type Method = 'refractometer' | 'hydrometer' | 'thermometer';

function Harness({ look }: { look?: 'pill' | 'tiles' }) {
  const [value, setValue] = useState<Method>('refractometer');
  return (
    <>
      <SegmentedControl<Method>
        label="Read with"
        look={look}
        value={value}
        options={[
          ['refractometer', 'Refractometer'],
          ['hydrometer', 'Hydrometer'],
          ['thermometer', 'Thermometer'],
        ]}
        onChange={setValue}
      />
      <output data-testid="value">{value}</output>
    </>
  );
}

describe('SegmentedControl', () => {
  it('is a named radio group with the chosen option checked', () => {
    render(<Harness />);
    expect(screen.getByRole('radiogroup', { name: 'Read with' })).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: 'Refractometer' })).toHaveAttribute('aria-checked', 'true');
    expect(screen.getByRole('radio', { name: 'Hydrometer' })).toHaveAttribute('aria-checked', 'false');
  });

  it('chooses by a tap', async () => {
    render(<Harness look="tiles" />);
    await userEvent.click(screen.getByRole('radio', { name: 'Hydrometer' }));
    expect(screen.getByRole('radio', { name: 'Hydrometer' })).toHaveAttribute('aria-checked', 'true');
    expect(screen.getByTestId('value')).toHaveTextContent('hydrometer');
  });

  it('chooses with Space or Enter, and moves with the arrow keys (wrapping at the ends)', async () => {
    render(<Harness />);
    await userEvent.tab();
    expect(screen.getByRole('radio', { name: 'Refractometer' })).toHaveFocus();
    await userEvent.keyboard('{ArrowRight}');
    expect(screen.getByRole('radio', { name: 'Hydrometer' })).toHaveFocus();
    expect(screen.getByTestId('value')).toHaveTextContent('hydrometer');
    await userEvent.keyboard('{ArrowLeft}{ArrowLeft}');
    expect(screen.getByRole('radio', { name: 'Thermometer' })).toHaveFocus();
    expect(screen.getByTestId('value')).toHaveTextContent('thermometer');
    await userEvent.keyboard('{ArrowDown}');
    expect(screen.getByTestId('value')).toHaveTextContent('refractometer');
    await userEvent.tab();
    expect(screen.getByRole('radio', { name: 'Hydrometer' })).toHaveFocus();
    await userEvent.keyboard(' ');
    expect(screen.getByTestId('value')).toHaveTextContent('hydrometer');
    await userEvent.tab();
    await userEvent.keyboard('{Enter}');
    expect(screen.getByTestId('value')).toHaveTextContent('thermometer');
  });
});
