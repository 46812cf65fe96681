/** Query keys: a password-reset link's status (who is signed in is src/lib/auth.ts's `meQueryOptions`). */
export const authKeys = {
  resetLink: (token: string) => ['password-reset', token] as const,
};
