import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Form, Formik } from 'formik';
import { describe, expect, it } from 'vitest';
import { Select, SelectField } from './select-field';

const options = (
  <>
    <option value="">Choose…</option>
    <option value="sg">SG</option>
    <option value="plato">°Plato</option>
  </>
);

describe('Select', () => {
  it('is named by its label and describes itself by its hint', () => {
    render(
      <Select label="Every value is in" hint="The unit of the value column." value="" onChange={() => {}}>
        {options}
      </Select>,
    );
    const select = screen.getByRole('combobox', { name: 'Every value is in' });
    expect(select).toHaveAccessibleDescription('The unit of the value column.');
    expect(select).not.toHaveAttribute('aria-invalid');
  });

  it('announces its error and ties it to the select', () => {
    render(
      <Select label="Every value is in" error="Choose sg, plato, brix, c or f." value="" onChange={() => {}}>
        {options}
      </Select>,
    );
    const select = screen.getByRole('combobox', { name: 'Every value is in' });
    expect(screen.getByRole('alert')).toHaveTextContent('Choose sg, plato, brix, c or f.');
    expect(select).toHaveAttribute('aria-invalid', 'true');
    expect(select).toHaveAccessibleDescription('Choose sg, plato, brix, c or f.');
  });

  it('keeps its name when the label is read out only', () => {
    render(
      <Select label="Role of Ivo Brannock" hideLabel value="sg" onChange={() => {}}>
        {options}
      </Select>,
    );
    expect(screen.getByRole('combobox', { name: 'Role of Ivo Brannock' })).toHaveValue('sg');
    expect(screen.queryByText('Role of Ivo Brannock')).not.toBeInTheDocument();
  });
});

describe('SelectField', () => {
  function Harness({ validate }: { validate?: (values: { unit: string }) => { unit?: string } }) {
    return (
      <Formik initialValues={{ unit: '' }} validate={validate} onSubmit={() => {}}>
        {({ values }) => (
          <Form>
            <SelectField name="unit" label="Gravity unit">
              {options}
            </SelectField>
            <output data-testid="value">{values.unit}</output>
            <button type="submit">Save</button>
          </Form>
        )}
      </Formik>
    );
  }

  it('stores the chosen option in its Formik field', async () => {
    render(<Harness />);
    await userEvent.selectOptions(screen.getByLabelText('Gravity unit'), 'plato');
    expect(screen.getByTestId('value')).toHaveTextContent('plato');
  });

  it('shows the field error only after a submit, announced', async () => {
    render(<Harness validate={(v) => (v.unit ? {} : { unit: 'Choose a gravity unit.' })} />);
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Choose a gravity unit.');
    expect(screen.getByLabelText('Gravity unit')).toHaveAttribute('aria-invalid', 'true');
  });
});
