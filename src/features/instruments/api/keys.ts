import type { ArchivedFilter } from './list-instruments';

/**
 * Query keys: one cache entry per resource. `/api/instruments` lives only under `lists()`, so a
 * new calibration reaches every page that shows instruments (the fermentation picker included,
 * composed in src/app).
 */
export const instrumentKeys = {
  all: ['instruments'] as const,
  lists: () => [...instrumentKeys.all, 'list'] as const,
  list: (archived: ArchivedFilter) => [...instrumentKeys.lists(), archived] as const,
  calibrations: (instrumentId: number) => [...instrumentKeys.all, 'calibrations', instrumentId] as const,
};

/** Query keys: invalidating `all` refreshes the kettle list and the default kettle. */
export const equipmentKeys = {
  all: ['equipment'] as const,
  list: () => [...equipmentKeys.all, 'list'] as const,
  default: () => [...equipmentKeys.all, 'default'] as const,
};
