/** Query keys: a brew's fermentation log (the instruments for the picker are the instruments feature's, passed in by src/app). */
export const fermentationKeys = {
  all: ['fermentation'] as const,
  log: (brewId: number) => [...fermentationKeys.all, 'log', brewId] as const,
  /** Older readings of a log, page by page (the log itself carries the latest). */
  olderReadings: (brewId: number) => [...fermentationKeys.log(brewId), 'older-readings'] as const,
};
