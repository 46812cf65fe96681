import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';

const updateServiceWorker = vi.fn(async () => undefined);
let needRefresh = false;
const setNeedRefresh = vi.fn((v: boolean) => {
  needRefresh = v;
});

// The registration itself is vite-plugin-pwa's; here only what the brewer sees and does.
vi.mock('virtual:pwa-register/react', () => ({
  useRegisterSW: () => ({ needRefresh: [needRefresh, setNeedRefresh], offlineReady: [false, vi.fn()], updateServiceWorker }),
}));

const { UpdatePrompt } = await import('./update-prompt');

describe('a new version of the app', () => {
  it('shows nothing while the running version is the newest', () => {
    needRefresh = false;
    const { container } = render(<UpdatePrompt />);
    expect(container).toBeEmptyDOMElement();
  });

  it('asks before swapping, and reloads into the new version only when the brewer says so', async () => {
    needRefresh = true;
    render(<UpdatePrompt />);
    expect(screen.getByText('A new version is ready: reload')).toBeInTheDocument();
    expect(updateServiceWorker).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Reload' }));
    expect(updateServiceWorker).toHaveBeenCalledWith(true);
  });

  it('can be put off until later', async () => {
    needRefresh = true;
    render(<UpdatePrompt />);
    await userEvent.click(screen.getByRole('button', { name: 'Later' }));
    expect(setNeedRefresh).toHaveBeenCalledWith(false);
  });
});
