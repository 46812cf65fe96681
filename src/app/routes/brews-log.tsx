import type { QueryClient } from '@tanstack/react-query';
import { ArrowLeft, Printer } from 'lucide-react';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { brewQueryOptions, useBrew } from '@/features/brews/api/get-brew';
import { BrewLog } from '@/features/brews/components/brew-log';
import { BrewMissing } from '@/features/brews/components/brew-missing';
import { BrewComments } from '@/features/reviews/components/brew-comments';
import { QueuedList } from '@/components/offline/queued-list';
import { Button } from '@/components/ui/button';
import { ButtonLink } from '@/components/ui/button-link';
import { Loading, PageHeader } from '@/components/ui/page';

export function loader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    if (Number.isInteger(id) && id > 0) void queryClient.prefetchQuery(brewQueryOptions(id));
    return null;
  };
}

export function Component() {
  const id = Number(useParams().id);
  const { data: brew, isPending, error } = useBrew(id);
  if (isPending) return <Loading label="Loading the log…" />;
  if (error || !brew) return <BrewMissing error={error} />;
  return (
    <>
      <PageHeader
        title={brew.name}
        subtitle={
          <>
            Brew-day log · {brew.recipeName}
            {!brew.isOwner && <> · by {brew.ownerName}</>}
          </>
        }
        actions={
          <div className="no-print flex flex-wrap gap-2">
            <ButtonLink to={`/brews/${brew.id}`} variant="secondary">
              <ArrowLeft aria-hidden className="size-5" /> Brew day
            </ButtonLink>
            <Button variant="secondary" icon={<Printer aria-hidden className="size-5" />} onClick={() => window.print()}>
              Print brew sheet
            </Button>
          </div>
        }
      />
      {brew.permissions.edit && (
        <div className="no-print mb-4">
          <QueuedList brewId={brew.id} title="Waiting to send" />
        </div>
      )}
      <BrewLog brew={brew} />
      <div className="mt-8">
        <BrewComments brewId={brew.id} canComment={brew.permissions.comment} />
      </div>
    </>
  );
}
