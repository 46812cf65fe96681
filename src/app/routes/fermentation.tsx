import { useQuery, type QueryClient } from '@tanstack/react-query';
import { ArrowLeft, Download } from 'lucide-react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { fermentationCsvUrl } from '@/features/fermentation/api/import-csv';
import { fermentationLogQueryOptions, useFermentationLog } from '@/features/fermentation/api/get-log';
import { BottleCaution } from '@/features/fermentation/components/bottle-caution';
import { CsvImport } from '@/features/fermentation/components/csv-import';
import { FermentationChart } from '@/features/fermentation/components/fermentation-chart';
import { PackagingForm } from '@/features/fermentation/components/packaging-form';
import { PackagingRecordView } from '@/features/fermentation/components/packaging-record';
import { ProgressPanel } from '@/features/fermentation/components/progress-panel';
import { OfflineStatus } from '@/components/offline/offline-status';
import { QueuedList } from '@/components/offline/queued-list';
import { ReadingForm } from '@/features/fermentation/components/reading-form';
import { ReadingsList } from '@/features/fermentation/components/readings-list';
import { instrumentsQueryOptions } from '@/features/instruments/api/list-instruments';
import { RemindersToggle } from '@/features/fermentation/components/reminders-toggle';
import { TemperaturePanel } from '@/features/fermentation/components/temperature-panel';
import { VerdictBanner } from '@/features/fermentation/components/verdict-banner';
import { shortDateTime } from '@/features/fermentation/components/words';
import { buttonClass } from '@/components/ui/button';
import { ButtonLink } from '@/components/ui/button-link';
import { Notice } from '@/components/ui/notice';
import { Card, Loading, PageHeader } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';

export function loader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    if (Number.isInteger(id) && id > 0) await queryClient.prefetchQuery(fermentationLogQueryOptions(id));
    return null;
  };
}

function Missing({ error }: { error: Error | null }) {
  const notFound = !error || (error instanceof ApiError && (error.status === 404 || error.status === 400));
  return (
    <div className="py-12 text-center">
      <h1 className="text-2xl font-bold text-cellar-900">{notFound ? 'Brew day not found' : 'Could not load the fermentation log'}</h1>
      <p className="mt-2 text-ink-soft">{notFound ? 'It does not exist, or it is not shared with you.' : error?.message}</p>
      <ButtonLink to="/" className="mt-6">
        Back home
      </ButtonLink>
    </div>
  );
}

export function Component() {
  const id = Number(useParams().id);
  const { data: log, isPending, error } = useFermentationLog(id);
  // The instruments feature's own cache entry, so a calibration saved there reaches the picker at once.
  const instruments = useQuery({ ...instrumentsQueryOptions(), enabled: log?.brew.isOwner === true });
  if (isPending) return <Loading label="Loading the fermentation log…" />;
  if (error || !log) return <Missing error={error} />;
  const { brew } = log;
  const canEdit = brew.isOwner;

  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <PageHeader
        title={brew.name}
        subtitle={
          <>
            Fermentation log{brew.pitchedAt ? ` · pitched ${shortDateTime(brew.pitchedAt)}` : ''}
            {!brew.isOwner && ` · ${brew.ownerName}'s brew`}
          </>
        }
        actions={
          <>
            <Link to={`/brews/${brew.id}`} className={buttonClass('quiet')}>
              <ArrowLeft aria-hidden className="size-5" /> Brew day
            </Link>
            <a href={fermentationCsvUrl(brew.id)} download className={buttonClass('secondary')}>
              <Download aria-hidden className="size-5" /> Export CSV
            </a>
          </>
        }
      />

      {!brew.pitchedAt ? (
        <Notice tone="info" title="No pitch time yet">
          Fermentation counts its days from pitching. Log the pitch temperature with “yeast pitched” on the{' '}
          <Link className="font-semibold underline" to={`/brews/${brew.id}`}>
            brew day
          </Link>{' '}
          first.
        </Notice>
      ) : (
        <>
          {log.verdict && <VerdictBanner verdict={log.verdict} now={log.now} />}
          <BottleCaution />
          {canEdit && (
            <>
              <OfflineStatus brewId={brew.id} />
              <QueuedList brewId={brew.id} kinds={['fermentation-reading']} title="Readings waiting to send" />
            </>
          )}
          {canEdit && (
            <Card>
              <h2 className="mb-3 text-lg font-semibold text-cellar-900">Add a reading</h2>
              <ReadingForm brewId={brew.id} og={brew.og} pitchedAt={brew.pitchedAt} instruments={instruments.data} instrumentsFailed={instruments.isError} />
            </Card>
          )}
        </>
      )}

      <Card>
        <h2 className="mb-3 text-lg font-semibold text-cellar-900">Gravity and temperature</h2>
        <FermentationChart log={log} />
      </Card>

      <div className="grid gap-4 lg:grid-cols-2">
        <Card>
          <h2 className="mb-3 text-lg font-semibold text-cellar-900">Attenuation and ABV</h2>
          <ProgressPanel progress={log.progress} />
        </Card>
        <Card>
          <h2 className="mb-3 text-lg font-semibold text-cellar-900">Fermenter temperature</h2>
          <TemperaturePanel summary={log.temperature} />
        </Card>
      </div>

      <Card>
        <h2 className="mb-1 text-lg font-semibold text-cellar-900">Readings ({(log.readingCount ?? log.readings.length).toLocaleString('en')})</h2>
        <ReadingsList log={log} canEdit={canEdit} />
      </Card>

      <Card>
        <h2 className="mb-3 text-lg font-semibold text-cellar-900">Packaging</h2>
        {log.packaging ? (
          <PackagingRecordView brewId={brew.id} record={log.packaging} canEdit={canEdit} />
        ) : canEdit && brew.pitchedAt ? (
          <PackagingForm log={log} />
        ) : (
          <p className="text-ink-soft">Not packaged yet.</p>
        )}
      </Card>

      {canEdit && brew.pitchedAt && (
        <Card>
          <h2 className="mb-3 text-lg font-semibold text-cellar-900">Import readings from CSV</h2>
          <CsvImport brewId={brew.id} />
        </Card>
      )}

      {canEdit && log.remindersEnabled !== null && (
        <Card>
          <h2 className="mb-3 text-lg font-semibold text-cellar-900">Reminders</h2>
          <RemindersToggle enabled={log.remindersEnabled} reminders={log.reminders} />
        </Card>
      )}
    </div>
  );
}
