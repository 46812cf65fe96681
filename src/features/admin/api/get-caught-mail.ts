import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaughtMessage } from '@shared/schemas/admin';
import { api } from '@/lib/api-client';
import { adminKeys } from './keys';

export const getCaughtMail = (signal?: AbortSignal) => api.get<CaughtMessage[]>('/api/admin/mail', { signal });

export const caughtMailQueryOptions = () => queryOptions({ queryKey: adminKeys.mail(), queryFn: ({ signal }) => getCaughtMail(signal), staleTime: 0 });

export function useCaughtMail() {
  return useQuery(caughtMailQueryOptions());
}
