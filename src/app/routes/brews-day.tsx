import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { FlaskConical, ScrollText } from 'lucide-react';
import { lazy, Suspense, useMemo } from 'react';
import { Link, useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { type BrewDetail, type BrewStage } from '@shared/schemas/brews';
import { brewQueryOptions, useBrew } from '@/features/brews/api/get-brew';
import { BrewDay } from '@/features/brews/components/brew-day';
import { BrewMissing } from '@/features/brews/components/brew-missing';
import { DeleteBrew } from '@/features/brews/components/delete-brew';
import { BrewSharingPanel } from '@/features/brews/components/sharing-panel';
import { instrumentsQueryOptions } from '@/features/instruments/api/list-instruments';
import type { LateBoilInitialValues } from '@/features/late-boil/components/form-values';
import { OfflineStatus } from '@/components/offline/offline-status';
import { QueuedList } from '@/components/offline/queued-list';
import { ButtonLink } from '@/components/ui/button-link';
import { Loading, PageHeader } from '@/components/ui/page';

// The late-boil check shows on the boil stage only: a brew day opened at another stage does not load it.
const loadBoilCheck = () => import('@/app/brew-boil-check');
const BrewBoilCheck = lazy(() => loadBoilCheck().then((m) => ({ default: m.BrewBoilCheck })));

export function loader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    if (Number.isInteger(id) && id > 0) void queryClient.prefetchQuery(brewQueryOptions(id));
    void queryClient.prefetchQuery(instrumentsQueryOptions());
    return null;
  };
}

/** The brew day's snapshot, as the late-boil check's starting values. */
function checkStart(brew: BrewDetail, wcf: number | undefined, calibrationTempC: number | undefined): LateBoilInitialValues {
  return {
    reading: { kind: 'refractometer', wcf, calibrationTempC },
    minutesLeft: 10,
    boilOffLPerHour: brew.boilOffLPerHour,
    targetSg: brew.targets.targetOg,
    targetVolumeL: brew.targets.batchVolumeL,
    targetFg: brew.targets.targetFg,
    kettleCapacityL: brew.equipment.kettleCapacityL ?? undefined,
    coolingShrinkage: brew.equipment.coolingShrinkage,
    kettleLossL: brew.equipment.trubLossL + brew.equipment.deadSpaceL,
  };
}

export function Component() {
  const id = Number(useParams().id);
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const { data: brew, isPending, error } = useBrew(id);
  const instruments = useQuery({ ...instrumentsQueryOptions(), enabled: Boolean(brew?.permissions.edit) });

  const refractometer = instruments.data?.find((i) => i.kind === 'refractometer' && !i.archived);
  const hydrometer = instruments.data?.find((i) => i.kind === 'hydrometer' && !i.archived);
  const initialValues = useMemo(
    () => (brew ? checkStart(brew, refractometer?.wcf != null ? Number(refractometer.wcf.toFixed(3)) : undefined, hydrometer?.calibrationTempC ?? undefined) : undefined),
    // Only what the check starts from; a refetch after saving must not reset what is typed.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [brew?.id, brew?.boilOffLPerHour, refractometer?.id, hydrometer?.id],
  );

  if (isPending) return <Loading label="Loading the brew day…" />;
  if (error || !brew) return <BrewMissing error={error} />;
  if (brew.permissions.edit && instruments.isPending) return <Loading label="Loading your instruments…" />;

  const stageParam = params.get('stage') as BrewStage | null;
  const selected = stageParam && brew.stages.some((s) => s.stage === stageParam) ? stageParam : brew.currentStage;
  const select = (stage: BrewStage) => setParams({ stage }, { replace: true });

  const boilCheck = brew.permissions.edit ? (
    <Suspense fallback={<Loading label="Loading the late-boil check…" />}>
      <BrewBoilCheck brew={brew} initialValues={initialValues} />
    </Suspense>
  ) : undefined;

  return (
    <>
      <PageHeader
        title={brew.name}
        subtitle={
          <>
            {brew.brewedOn} · {brew.recipeName}{' '}
            <Link className="underline" to={`/recipes/${brew.targets.recipeId}?version=${brew.targets.recipeVersion}`}>
              (brewed from version {brew.targets.recipeVersion})
            </Link>
            {!brew.isOwner && <> · by {brew.ownerName}</>}
          </>
        }
        actions={
          <>
            <ButtonLink to={`/brews/${brew.id}/log`} variant="secondary">
              <ScrollText aria-hidden className="size-5" /> Log and brew sheet
            </ButtonLink>
            {brew.pitchedAt && (
              <ButtonLink to={`/brews/${brew.id}/fermentation`} variant="secondary">
                <FlaskConical aria-hidden className="size-5" /> Fermentation
              </ButtonLink>
            )}
          </>
        }
      />
      {brew.permissions.edit && (
        <div className="mb-4 space-y-3">
          <OfflineStatus brewId={brew.id} />
          <QueuedList brewId={brew.id} title="Waiting to send" />
        </div>
      )}
      <BrewDay brew={brew} instruments={instruments.data ?? []} selected={selected} onSelect={select} boilCheck={boilCheck} />
      {brew.permissions.edit && (
        <details className="no-print mt-6 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
          <summary className="flex min-h-touch cursor-pointer items-center text-lg font-bold text-cellar-900">Sharing and deleting</summary>
          <div className="mt-3 space-y-4">
            <BrewSharingPanel brew={brew} />
            <DeleteBrew brewId={brew.id} onDeleted={() => navigate('/brews')} />
          </div>
        </details>
      )}
    </>
  );
}
