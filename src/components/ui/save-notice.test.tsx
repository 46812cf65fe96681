import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, NetworkError } from '@/lib/api-client';
import { toSaveFailure } from '@/lib/save-failure';
import { SaveNotice } from './save-notice';

afterEach(() => vi.restoreAllMocks());

describe('a failed save', () => {
  it('treats a 503 from the server like no connection: what was typed is kept, and a retry is offered', async () => {
    vi.spyOn(globalThis, 'fetch').mockResolvedValue(
      new Response(JSON.stringify({ error: 'unavailable', message: 'database away' }), { status: 503, headers: { 'Retry-After': '5', 'Content-Type': 'application/json' } }),
    );
    const error = await api.post('/api/brews/1/notes', { body: 'x' }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(NetworkError);
    expect((error as NetworkError).retryAfterSeconds).toBe(5);
    const onRetry = vi.fn();
    render(<SaveNotice failure={toSaveFailure(error)} onRetry={onRetry} />);
    expect(screen.getByText('Not saved — no connection')).toBeInTheDocument();
    expect(screen.getByText(/Can’t reach the server, what you typed is kept/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Retry' }));
    expect(onRetry).toHaveBeenCalledOnce();
  });

  it('shows a refusal in the server’s words, and nothing when there is no failure', () => {
    const { rerender } = render(<SaveNotice failure={{ kind: 'error', message: 'Use at most 80 characters.' }} />);
    expect(screen.getByRole('alert')).toHaveTextContent('Not savedUse at most 80 characters.What you entered is still here: try again.');
    rerender(<SaveNotice failure={undefined} />);
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
