import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { COMMENT_MAX_CHARS } from '@shared/schemas/comments';
import { CommentForm } from './comment-form';

function renderForm() {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <CommentForm brewId={42} target={{ kind: 'decision', id: 7 }} label="Your comment on the late-boil decision" />
    </QueryClientProvider>,
  );
}

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('CommentForm', () => {
  it('refuses an empty comment and one over the limit with the API’s words, and sends nothing', async () => {
    const fetch = vi.fn();
    vi.stubGlobal('fetch', fetch);
    renderForm();
    await userEvent.click(screen.getByRole('button', { name: 'Post comment' }));
    expect(await screen.findByText('Write the comment.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('textbox', { name: 'Your comment on the late-boil decision' }));
    await userEvent.paste('x'.repeat(COMMENT_MAX_CHARS + 1));
    await userEvent.click(screen.getByRole('button', { name: 'Post comment' }));
    expect(await screen.findByText(`Use at most ${COMMENT_MAX_CHARS} characters.`)).toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();
  });

  it('keeps the comment when the connection is lost, and posts it on retry', async () => {
    const fetch = vi.fn().mockRejectedValueOnce(new TypeError('Failed to fetch'));
    vi.stubGlobal('fetch', fetch);
    renderForm();
    await userEvent.type(screen.getByRole('textbox', { name: 'Your comment on the late-boil decision' }), 'Good call.');
    await userEvent.click(screen.getByRole('button', { name: 'Post comment' }));
    expect(await screen.findByText('Not posted — no connection')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Your comment on the late-boil decision' })).toHaveValue('Good call.');

    fetch.mockResolvedValueOnce(json(201, { comment: { id: 1 }, noticeSent: true }));
    await userEvent.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Comment posted.')).toBeInTheDocument();
    await waitFor(() => expect(screen.getByRole('textbox', { name: 'Your comment on the late-boil decision' })).toHaveValue(''));
    expect(fetch).toHaveBeenCalledTimes(2);
    expect(fetch.mock.calls[1][0]).toBe('/api/brews/42/comments');
    expect(JSON.parse((fetch.mock.calls[1][1] as RequestInit).body as string)).toEqual({ body: 'Good call.', target: { kind: 'decision', id: 7 } });
  });

  it('says why when the brew day was unshared, and keeps the words', async () => {
    vi.stubGlobal('fetch', vi.fn().mockResolvedValueOnce(json(404, { error: 'not_found', message: 'This brew day is no longer shared with your club.' })));
    renderForm();
    await userEvent.type(screen.getByRole('textbox', { name: 'Your comment on the late-boil decision' }), 'Nice.');
    await userEvent.click(screen.getByRole('button', { name: 'Post comment' }));
    expect(await screen.findByText('This brew day is no longer shared with your club.')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Your comment on the late-boil decision' })).toHaveValue('Nice.');
  });
});
