import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import type { Me } from '@shared/schemas/auth';
import { meQueryOptions } from '@/lib/auth';
import { RootLayout } from './root-layout';

const me: Me = { id: 1, email: 'brewer@example.org', displayName: 'Test Brewer', unitSystem: 'metric', gravityUnit: 'sg', colourScale: 'srm', gallonUnit: 'us', siteRole: 'user', clubs: [] };

function renderLayout() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  queryClient.setQueryData(meQueryOptions().queryKey, me);
  const router = createMemoryRouter([{ element: <RootLayout />, children: [{ path: '*', element: <h1>A page</h1> }] }], { initialEntries: ['/recipes'] });
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
}

describe('the phone menu, by keyboard', () => {
  it('opens from the Menu button, closes on Escape and gives focus back to the button', async () => {
    const user = userEvent.setup();
    renderLayout();
    const menu = await screen.findByRole('button', { name: 'Menu' });
    expect(menu).toHaveAttribute('aria-expanded', 'false');

    menu.focus();
    await user.keyboard('{Enter}');
    expect(menu).toHaveAttribute('aria-expanded', 'true');
    // Focus inside the open menu, as after tabbing into it.
    screen.getByRole('link', { name: 'Brew days' }).focus();

    await user.keyboard('{Escape}');
    expect(menu).toHaveAttribute('aria-expanded', 'false');
    expect(menu).toHaveFocus();
  });

  it('leaves Escape alone while the menu is closed', async () => {
    const user = userEvent.setup();
    renderLayout();
    const link = await screen.findByRole('link', { name: 'Wortwise' });
    link.focus();
    await user.keyboard('{Escape}');
    expect(link).toHaveFocus();
    expect(screen.getByRole('button', { name: 'Menu' })).toHaveAttribute('aria-expanded', 'false');
  });
});
