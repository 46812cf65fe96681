/** Query keys: invalidating `all` refreshes the queue, every review page and every comment list. */
export const reviewKeys = {
  all: ['reviews'] as const,
  queue: () => [...reviewKeys.all, 'queue'] as const,
  reviewed: () => [...reviewKeys.all, 'reviewed'] as const,
  review: (brewId: number) => [...reviewKeys.all, 'review', brewId] as const,
  comments: (brewId: number) => [...reviewKeys.all, 'comments', brewId] as const,
};
