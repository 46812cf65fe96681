import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaughtMessage } from '@shared/schemas/admin';
import { api } from '@/lib/api-client';

export const getCaughtMail = () => api.get<CaughtMessage[]>('/api/admin/mail');

export const caughtMailQueryOptions = () => queryOptions({ queryKey: ['admin', 'mail'], queryFn: getCaughtMail, staleTime: 0 });

export function useCaughtMail() {
  return useQuery(caughtMailQueryOptions());
}
