import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ShowMore } from './show-more';

describe('ShowMore', () => {
  it('asks for the next page when pressed, and says so while it loads', async () => {
    const fetchNextPage = vi.fn(async () => undefined);
    const { rerender } = render(<ShowMore pages={{ hasNextPage: true, isFetchingNextPage: false, fetchNextPage }} label="Show more brew days" />);
    await userEvent.click(screen.getByRole('button', { name: 'Show more brew days' }));
    expect(fetchNextPage).toHaveBeenCalledTimes(1);

    rerender(<ShowMore pages={{ hasNextPage: true, isFetchingNextPage: true, fetchNextPage }} label="Show more brew days" />);
    expect(screen.getByRole('button', { name: 'Loading more…' })).toBeDisabled();
  });

  it('draws nothing on the last page, or while the list shows stale rows', () => {
    const fetchNextPage = vi.fn(async () => undefined);
    const { rerender } = render(<ShowMore pages={{ hasNextPage: false, isFetchingNextPage: false, fetchNextPage }} label="Show more recipes" />);
    expect(screen.queryByRole('button')).toBeNull();
    rerender(<ShowMore pages={{ hasNextPage: true, isFetchingNextPage: false, fetchNextPage }} label="Show more recipes" hidden />);
    expect(screen.queryByRole('button')).toBeNull();
  });
});
