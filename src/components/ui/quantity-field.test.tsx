import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Formik } from 'formik';
import { describe, expect, it } from 'vitest';
import { unitsFor } from '@/lib/units';
import { QuantityField } from './quantity-field';

function Harness({ initial, units }: { initial: number | ''; units: ReturnType<typeof unitsFor> }) {
  return (
    <QueryClientProvider client={new QueryClient()}>
    <Formik initialValues={{ volumeL: initial }} onSubmit={() => {}}>
      {({ values }) => (
        <>
          <QuantityField name="volumeL" kind="volume" label="Batch volume" units={units} />
          <output data-testid="si">{String(values.volumeL)}</output>
        </>
      )}
    </Formik>
    </QueryClientProvider>
  );
}

describe('QuantityField', () => {
  it('shows an SI value in US gallons and stores what is typed as litres', async () => {
    render(<Harness initial={18.92706} units={unitsFor({ unitSystem: 'us', gravityUnit: 'sg' })} />);
    const input = screen.getByLabelText('Batch volume');
    expect(input).toHaveValue('5');
    expect(screen.getByText('gal')).toBeInTheDocument();
    await userEvent.clear(input);
    await userEvent.type(input, '6');
    // 6 US gal = 22.712470704 L (US gallon defined as 3.785411784 L exactly).
    expect(Number(screen.getByTestId('si').textContent)).toBeCloseTo(22.712470704, 9);
  });

  it('says so when the text is not a number', async () => {
    render(<Harness initial="" units={unitsFor({ unitSystem: 'metric', gravityUnit: 'sg' })} />);
    await userEvent.type(screen.getByLabelText('Batch volume'), 'abc');
    expect(screen.getByRole('alert')).toHaveTextContent('Enter a number.');
  });
});
