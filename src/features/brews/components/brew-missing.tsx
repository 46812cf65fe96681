import { ButtonLink } from '@/components/ui/button-link';
import { ApiError } from '@/lib/api-client';

/** Not found and not shared with you look the same: nobody learns another brewer's brew day exists. */
export function BrewMissing({ error }: { error: Error | null }) {
  const notFound = !error || (error instanceof ApiError && (error.status === 404 || error.status === 400));
  return (
    <div className="py-12 text-center">
      <h1 className="text-2xl font-bold text-cellar-900">{notFound ? 'Brew day not found' : 'Could not load the brew day'}</h1>
      <p className="mt-2 text-ink-soft">{notFound ? 'It does not exist, or it is not shared with you.' : error?.message}</p>
      <ButtonLink to="/brews" className="mt-6">
        Back to brew days
      </ButtonLink>
    </div>
  );
}
