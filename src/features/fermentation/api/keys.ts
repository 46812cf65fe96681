/** Query keys: a brew's fermentation log, and the brewer's instruments for the picker. */
export const fermentationKeys = {
  all: ['fermentation'] as const,
  log: (brewId: number) => [...fermentationKeys.all, 'log', brewId] as const,
  instruments: () => [...fermentationKeys.all, 'instruments'] as const,
};
