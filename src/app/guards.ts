import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { meQueryOptions } from '@/lib/auth';

/** Loader for routes that need a signed-in brewer: sends everyone else to sign in, then back. */
export function requireSignedIn(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) {
      const url = new URL(request.url);
      throw redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`);
    }
    return me;
  };
}

/** Only follow `next` to our own pages. */
export function safeNext(next: string | null) {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}
