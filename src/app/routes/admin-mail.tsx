import { useQuery } from '@tanstack/react-query';
import { RefreshCw } from 'lucide-react';
import { caughtMailQueryOptions } from '@/features/admin/api/get-caught-mail';
import { AdminTabs } from '@/features/admin/components/admin-tabs';
import { CaughtMailList } from '@/features/admin/components/caught-mail-list';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading, PageHeader } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { Component as NotFound } from './not-found';

/** Site admins, in development: every e-mail the local fake SMTP server caught. */
export function Component() {
  const { data: me } = useMe();
  const isAdmin = me?.siteRole === 'admin';
  const mail = useQuery({ ...caughtMailQueryOptions(), enabled: isAdmin });
  if (!isAdmin) return <NotFound />;
  return (
    <>
      <PageHeader
        title="Site admin"
        subtitle="Mail caught by the local fake SMTP server (development and tests only)."
        actions={
          <Button variant="secondary" icon={<RefreshCw aria-hidden className="size-4" />} busy={mail.isFetching} onClick={() => mail.refetch()}>
            Refresh
          </Button>
        }
      />
      <AdminTabs />
      {mail.isPending ? (
        <Loading label="Loading caught mail…" />
      ) : mail.error ? (
        <Notice tone={mail.error instanceof ApiError && mail.error.status === 404 ? 'info' : 'error'}>
          {mail.error instanceof ApiError && mail.error.status === 404
            ? 'No local mail catcher here: this server sends through a real mail provider.'
            : mail.error.message}
        </Notice>
      ) : (
        <CaughtMailList messages={mail.data} />
      )}
    </>
  );
}
