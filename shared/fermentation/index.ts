/** The fermentation log's pure logic: the verdict, temperature and progress summaries, and our CSV format. */
export { fermentationVerdict, type VerdictReading } from './verdict';
export { temperatureSummary, SWING_FLAG_C, type TemperaturePoint } from './temperature';
export { fermentationProgress, ABV_SIMPLE_LABEL, ABV_EXACT_LABEL, type ProgressInput } from './progress';
export {
  CSV_COLUMNS,
  CSV_EXPORT_EXTRA_COLUMNS,
  emptyMapping,
  suggestMapping,
  parseTakenAt,
  parseNumber,
  parseUnit,
  parseKind,
  readRow,
  dedupeMaterial,
  primaryValue,
  roundFor,
  type ImportedRow,
  type RowContext,
  type RowResult,
} from './import';
