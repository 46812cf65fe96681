/** Instruments: correcting a reading with its calibration snapshot, and the calibration flows' arithmetic. */
export {
  correctReading,
  defaultSnapshot,
  phCalibrationStatus,
  type Correction,
  type CorrectedReading,
  type HydrometerRaw,
  type PhCalibrationStatus,
  type PhMeterRaw,
  type RawByKind,
  type RefractometerRaw,
  type ThermometerRaw,
} from './correct-reading';
export {
  thermometerCheck,
  wcfCalibration,
  WCF_SPREAD_WARNING,
  type ThermometerCheckInput,
  type ThermometerCheckResult,
  type WcfCalibrationResult,
  type WcfPairReading,
  type WcfPairResult,
} from './calibration';
export { instrumentSnapshotSchema, type InstrumentSnapshot } from '../schemas/instruments';
