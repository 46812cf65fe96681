/** Query keys: invalidating `all` refreshes the club list, every club page and its invitations. */
export const clubKeys = {
  all: ['clubs'] as const,
  detail: (id: number) => [...clubKeys.all, id] as const,
  invitations: (clubId: number) => [...clubKeys.all, clubId, 'invitations'] as const,
  /** An invitation link as its recipient opens it (no club membership yet). */
  invitation: (token: string) => ['invitations', token] as const,
};
