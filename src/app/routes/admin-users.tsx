import { Form, Formik } from 'formik';
import { useState } from 'react';
import { useUsers } from '@/features/admin/api/list-users';
import { AdminTabs } from '@/features/admin/components/admin-tabs';
import { UserTable } from '@/features/admin/components/user-table';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading, PageHeader } from '@/components/ui/page';
import { TextField } from '@/components/ui/text-field';
import { useMe } from '@/lib/auth';
import { Component as NotFound } from './not-found';

const pageSize = 25;

export function Component() {
  const { data: me } = useMe();
  const [query, setQuery] = useState({ page: 1, q: '' });
  const isAdmin = me?.siteRole === 'admin';
  const users = useUsers({ page: query.page, pageSize, ...(query.q && { q: query.q }) }, isAdmin);
  if (!isAdmin) return <NotFound />;
  const pages = users.data ? Math.max(1, Math.ceil(users.data.total / pageSize)) : 1;
  return (
    <>
      <PageHeader title="Site admin" subtitle="Every Wortwise account." />
      <AdminTabs />
      <Formik initialValues={{ q: query.q }} onSubmit={(v) => setQuery({ page: 1, q: v.q.trim() })}>
        <Form className="mb-4 flex items-end gap-2">
          <TextField name="q" type="search" label="Find by name or e-mail" className="min-w-0 flex-1" autoComplete="off" />
          <Button type="submit" variant="secondary">
            Find
          </Button>
        </Form>
      </Formik>
      {users.isPending ? (
        <Loading label="Loading accounts…" />
      ) : users.error ? (
        <Notice tone="error">{users.error.message}</Notice>
      ) : (
        <>
          <p className="mb-2 text-sm text-ink-faint">
            {users.data.total} {users.data.total === 1 ? 'account' : 'accounts'}
            {query.q && <> matching “{query.q}”</>}
          </p>
          <UserTable users={users.data.items} />
          {pages > 1 && (
            <div className="mt-4 flex items-center justify-between gap-2">
              <Button variant="secondary" disabled={query.page <= 1} onClick={() => setQuery((s) => ({ ...s, page: s.page - 1 }))}>
                Newer
              </Button>
              <span className="text-sm text-ink-soft">
                Page {query.page} of {pages}
              </span>
              <Button variant="secondary" disabled={query.page >= pages} onClick={() => setQuery((s) => ({ ...s, page: s.page + 1 }))}>
                Older
              </Button>
            </div>
          )}
        </>
      )}
    </>
  );
}
