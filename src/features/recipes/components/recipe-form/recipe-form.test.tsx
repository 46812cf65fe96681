import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Me } from '@shared/schemas/auth';
import { meQueryOptions } from '@/lib/auth';
import { RecipeForm } from './recipe-form';

function renderForm(prefs: Partial<Pick<Me, 'unitSystem' | 'gravityUnit' | 'colourScale'>> = {}) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const me: Me = { id: 1, email: 'maple@example.org', displayName: 'Maple Thorne', siteRole: 'user', clubs: [], unitSystem: 'metric', gravityUnit: 'sg', colourScale: 'srm', gallonUnit: 'us', ...prefs };
  queryClient.setQueryData(meQueryOptions().queryKey, me);
  const onSaved = vi.fn();
  render(
    <QueryClientProvider client={queryClient}>
      <RecipeForm onSaved={onSaved} />
    </QueryClientProvider>,
  );
  return { onSaved };
}

/** The field's inline error, found through the input's aria-describedby. */
function errorOf(label: string | RegExp, container: HTMLElement = document.body) {
  const input = within(container).getByLabelText(label);
  const id = input.getAttribute('aria-describedby');
  return id ? document.getElementById(id.split(' ').pop()!)?.textContent : null;
}

async function fill(label: string | RegExp, text: string, container: HTMLElement = document.body) {
  const input = within(container).getByLabelText(label);
  await userEvent.clear(input);
  await userEvent.type(input, text);
}

afterEach(() => {
  vi.unstubAllGlobals();
  localStorage.clear();
});

// Typing into a long form in jsdom is slow; a test's budget is about the form, not the machine.
describe('RecipeForm validation', { timeout: 30_000 }, () => {
  it('shows every missing field inline and sends nothing', async () => {
    const fetchSpy = vi.fn();
    vi.stubGlobal('fetch', fetchSpy);
    const { onSaved } = renderForm();
    await userEvent.click(screen.getByRole('button', { name: 'Create recipe' }));
    await waitFor(() => expect(errorOf('Recipe name')).toBe('Enter a name for the recipe.'));
    expect(errorOf('Batch volume into the fermenter')).toBe('Enter the batch volume into the fermenter.');
    expect(errorOf('Target OG')).toBe('Enter the target OG.');
    expect(errorOf('Lowest fermentation temperature')).toBe('Enter the lowest fermentation temperature.');
    const fermentable = screen.getByRole('group', { name: 'Fermentable 1' });
    expect(errorOf('Amount', fermentable)).toBe('Enter the amount.');
    expect(screen.getByText(/fields need attention/)).toBeInTheDocument();
    expect(fetchSpy).not.toHaveBeenCalled();
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('gives the same messages as the API for the brewing mistakes', async () => {
    // The strings below are the API's (server/recipes/recipes.test.ts): one shared zod schema.
    vi.stubGlobal('fetch', vi.fn());
    renderForm();
    await fill('Pre-boil volume', '24');
    await fill('Post-boil volume', '26');
    await fill('Target OG', '1.040');
    await fill('Target FG', '1.050');
    const fermentable = screen.getByRole('group', { name: 'Fermentable 1' });
    await fill('Amount', '-2', fermentable);
    await userEvent.click(screen.getByRole('button', { name: 'Create recipe' }));
    await waitFor(() => expect(errorOf('Post-boil volume')).toBe('Post-boil volume cannot be above the pre-boil volume: a boil only loses water.'));
    expect(errorOf('Target FG')).toBe('Target FG must be below the target OG: fermentation only lowers gravity.');
    expect(errorOf('Amount', fermentable)).toBe('Amount cannot be negative.');
  });

  it('flags a boil-off rate that contradicts the volumes and offers the implied one', async () => {
    vi.stubGlobal('fetch', vi.fn());
    renderForm();
    // 28 L to 24 L in 60 minutes is 4 L/h; 2 L/h would leave 26 L.
    await fill('Pre-boil volume', '28');
    await fill('Post-boil volume', '24');
    await fill('Boil-off rate', '2');
    await userEvent.tab();
    await waitFor(() => expect(errorOf('Boil-off rate')).toMatch(/^This boil-off rate does not match the volumes: over 60 minutes it would leave 26\.0 L/));
    await userEvent.click(screen.getByRole('button', { name: /^Use 4\.0\sL\/h, from the volumes$/ }));
    await waitFor(() => expect(screen.getByLabelText('Boil-off rate')).toHaveValue('4'));
    expect(errorOf('Boil-off rate')).toBeFalsy();
  });

  it('shows the estimated OG and ABV live beside the targets', async () => {
    vi.stubGlobal('fetch', vi.fn());
    renderForm();
    // 4.6 kg × 300 points·L/kg × 75 % / 23 L = 45 points: 1.045 (points·litres balance).
    await fill('Batch volume into the fermenter', '23');
    await fill('Brewhouse efficiency', '75');
    const fermentable = screen.getByRole('group', { name: 'Fermentable 1' });
    await fill('Amount', '4.6', fermentable);
    await fill('Target OG', '1.050');
    await fill('Target FG', '1.010');
    const panel = screen.getByText('Estimated OG').closest('dl')!;
    expect(within(panel).getByText('1.045')).toBeInTheDocument();
    // (1.050 − 1.010) × 131.25 = 5.25 %, shown to one decimal.
    expect(within(panel).getByText('5.3 %')).toBeInTheDocument();
    expect(screen.getByText(/The fermentables give 5 points less than the target/)).toBeInTheDocument();
  });

  it('shows estimated bitterness (Tinseth) and colour (Morey) live, colour in the brewer’s EBC', async () => {
    vi.stubGlobal('fetch', vi.fn());
    renderForm({ colourScale: 'ebc' });
    await fill('Batch volume into the fermenter', '23');
    await fill('Brewhouse efficiency', '75');
    const fermentable = screen.getByRole('group', { name: 'Fermentable 1' });
    await fill('Amount', '4.6', fermentable);
    const panel = () => screen.getByText('Estimated bitterness').closest('dl')!;
    // No hops: no bitterness estimate at all, never "0 IBU".
    expect(within(panel()).getAllByText('—').length).toBeGreaterThan(0);
    expect(screen.getByText(/No hops, so no bitterness estimate/)).toBeInTheDocument();
    // Pale malt at 6 EBC = 3.046 °L (EBC = 1.97 × °L). Morey: 4.6 kg = 10.1413 lb × 3.046 = 30.890;
    // 23 L = 6.07596 gal; MCU 5.0840; 5.0840^0.6859 = 3.0505; × 1.4922 = 4.552 SRM × 1.97 = 8.97 → "9 EBC".
    await fill('Colour', '6', fermentable);
    expect(within(panel()).getByText('9 EBC')).toBeInTheDocument();
    // 25 g of 8 % hops for 60 minutes. OG estimate 1.045; no boil volumes yet, so boil SG 1.045.
    // Tinseth: 1.65 × 0.000125^0.045 = 1.65 × 0.667361 = 1.101146; × (1 − e^−2.4)/4.15 = × 0.219104 → 0.241266;
    // 0.08 × 25 000 / 23 = 86.957 mg/L × 0.241266 = 20.98 → "21 IBU".
    await userEvent.click(screen.getByRole('button', { name: 'Add a hop' }));
    const hop = screen.getByRole('group', { name: 'Hop 1' });
    await fill('Amount', '25', hop);
    await fill('Minutes', '60', hop);
    await fill('Alpha acid', '8', hop);
    expect(within(panel()).getByText('21 IBU')).toBeInTheDocument();
    await fill('Target OG', '1.045');
    await fill('Target bitterness', '40');
    // BU:GU: 40 IBU over the target OG's 45 points = 0.89
    expect(within(panel()).getByText('0.89')).toBeInTheDocument();
    expect(screen.getByText(/The hops give 21 IBU, below the 40 IBU target/)).toBeInTheDocument();
  });

  it('keeps a draft of a new recipe through a reload, until it is discarded', async () => {
    vi.stubGlobal('fetch', vi.fn());
    renderForm();
    await fill('Recipe name', 'Half-typed porter');
    await waitFor(() => expect(localStorage.getItem('wortwise:recipe-draft:new')).toContain('Half-typed porter'));
    cleanup();
    renderForm();
    expect(screen.getByLabelText('Recipe name')).toHaveValue('Half-typed porter');
    expect(screen.getByText('Your unsaved changes are back')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Discard them' }));
    expect(screen.getByLabelText('Recipe name')).toHaveValue('');
    expect(localStorage.getItem('wortwise:recipe-draft:new')).toBeNull();
  });

  it('takes a US brewer’s gallons, pounds and °F and validates them the same way', async () => {
    vi.stubGlobal('fetch', vi.fn());
    renderForm({ unitSystem: 'us', gravityUnit: 'plato' });
    expect(within(screen.getByLabelText('Pre-boil volume').parentElement!).getByText('gal')).toBeInTheDocument();
    await fill('Pre-boil volume', '6');
    await fill('Post-boil volume', '7');
    await userEvent.click(screen.getByRole('button', { name: 'Create recipe' }));
    await waitFor(() => expect(errorOf('Post-boil volume')).toBe('Post-boil volume cannot be above the pre-boil volume: a boil only loses water.'));
    // Gravity in °Plato for this brewer: 12 °P is about 1.048, so an FG of 14 °P is above the OG.
    await fill('Target OG', '12');
    await fill('Target FG', '14');
    await waitFor(() => expect(errorOf('Target FG')).toBe('Target FG must be below the target OG: fermentation only lowers gravity.'));
  });

  it('keeps everything typed when the connection drops, and offers to try again', async () => {
    const fetchSpy = vi.fn().mockRejectedValue(new TypeError('Failed to fetch'));
    vi.stubGlobal('fetch', fetchSpy);
    const { onSaved } = renderForm();
    await fill('Recipe name', 'Kettle-side Saison');
    await fill('Batch volume into the fermenter', '20');
    await fill('Pre-boil volume', '26');
    await fill('Post-boil volume', '22');
    await fill('Boil-off rate', '4');
    await fill('Target OG', '1.052');
    await fill('Target FG', '1.006');
    await fill('Lowest fermentation temperature', '20');
    await fill('Highest fermentation temperature', '26');
    const fermentable = screen.getByRole('group', { name: 'Fermentable 1' });
    await fill('Name', 'Pilsner malt', fermentable);
    await fill('Amount', '4.5', fermentable);
    await userEvent.click(screen.getByRole('button', { name: 'Create recipe' }));
    await screen.findByText(/Can’t reach the server, what you typed is kept/);
    expect(screen.getByLabelText('Recipe name')).toHaveValue('Kettle-side Saison');
    expect(within(fermentable).getByLabelText('Amount')).toHaveValue('4.5');
    expect(fetchSpy).toHaveBeenCalledTimes(1);
    const sent = JSON.parse(fetchSpy.mock.calls[0][1].body);
    expect(sent).toMatchObject({ name: 'Kettle-side Saison', batchVolumeL: 20, efficiency: 0.72, fermentables: [{ name: 'Pilsner malt', kind: 'grain', amountKg: 4.5, potentialPointsLPerKg: 300 }] });

    await userEvent.click(screen.getByRole('button', { name: 'Retry' }));
    await waitFor(() => expect(fetchSpy).toHaveBeenCalledTimes(2));
    expect(onSaved).not.toHaveBeenCalled();
  });
});
