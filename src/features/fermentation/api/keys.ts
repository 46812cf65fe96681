/** Query keys: a brew's fermentation log (the instruments for the picker are the instruments feature's, passed in by src/app). */
export const fermentationKeys = {
  all: ['fermentation'] as const,
  log: (brewId: number) => [...fermentationKeys.all, 'log', brewId] as const,
};
