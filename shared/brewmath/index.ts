/**
 * Wortwise brewing math: every number the product shows or stores comes from here. Pure, no
 * I/O, imported by both the React forms and the Express routes.
 *
 * SI inside (litres, kilograms, grams, °C) and specific gravity at 20/20 °C; parameter names
 * carry their unit. Impossible input throws a BrewMathError; no function returns NaN or Infinity.
 * The model (hot and cold volumes, what counts as extract, which formulas and why) is in
 * docs/decisions/0002-brewing-math-model.md.
 */
export { BrewMathError, type BrewMathErrorCode } from './errors';
export { SG_MIN, SG_MAX, BRIX_MIN, BRIX_MAX, VOLUME_MAX_L, MASS_MAX_KG } from './validate';
export {
  platoToSg,
  sgToPlato,
  brixToSg,
  sgToBrix,
  sgToPoints,
  pointsToSg,
  PLATO_MIN,
  PLATO_MAX,
  WCF_MIN,
  WCF_MAX,
} from './gravity';
export { correctHydrometer, hydrometerTempWarning, waterDensityKgM3 } from './hydrometer';
export {
  DEFAULT_WCF,
  wcfFromPairs,
  refractometerWithAlcoholSg,
  fermentingRefractometerSg,
  TERRILL_FIT_RANGE,
  NO_DROP_BRIX,
  type FermentingRefractometerEstimate,
  type BrixSgPair,
  type WcfEstimate,
} from './refractometer';
export {
  abvPercent,
  abvPercentExact,
  apparentAttenuation,
  fgFromAttenuation,
  DEFAULT_APPARENT_ATTENUATION,
} from './abv';
export {
  EXTRACT_KINDS,
  EXTRACT_POTENTIALS_POINTS_L_PER_KG,
  EXTRACT_VOLUME_L_PER_KG,
  POTENTIAL_MIN_POINTS_L_PER_KG,
  POTENTIAL_MAX_POINTS_L_PER_KG,
  waterToDiluteL,
  extractToAddKg,
  afterAddingWater,
  afterAddingExtract,
  estimateOg,
  type ExtractKind,
  type FermentableKind,
  type Fermentable,
  type EstimateOgInput,
  type WortState,
} from './extract';
export {
  DEFAULT_COOLING_SHRINKAGE,
  DEFAULT_TOLERANCE_SG,
  MAX_EXTRA_BOIL_MINUTES,
  KETTLE_HEADROOM_FRACTION,
  projectBoil,
  boilCorrection,
  boilOffRateLPerHour,
  type BoilProjectionInput,
  type BoilCorrectionInput,
  type BoilCorrection,
  type BoilStatus,
  type BoilOption,
  type EndState,
  type AsIsOption,
  type ExtractOption,
  type WaterOption,
  type BoilLongerOption,
  type InfeasibleExtractOption,
  type InfeasibleOption,
  type InfeasibleCode,
} from './boil';
export {
  fgStability,
  FG_FIRST_CHECK_DAY,
  FG_MIN_SPAN_DAYS,
  FG_RESOLUTION_SG,
  FG_TREND_LIMIT_SG_PER_DAY,
  FG_STUCK_MARGIN_SG,
  fgStates,
  expectedFinalGravity,
  type ComparedReading,
  type GravityReading,
  type FgStabilityOptions,
  type FgStability,
  type FgState,
} from './fermentation';
export {
  boilingPointC,
  isaPressurePa,
  waterBoilingPointAtPressureC,
  thermometerBoilOffsetC,
  ELEVATION_MIN_M,
  ELEVATION_MAX_M,
} from './thermometer';
export {
  primingSugarG,
  residualCo2Volumes,
  PRIMING_SUGARS,
  PRIMING_G_PER_L_PER_CO2_VOLUME,
  type PrimingSugar,
  type PrimingInput,
} from './priming';
export { SOURING_PH_BAND, souringProgress, souringTargetReached, type SouringReadingIn, type SouringStep } from './souring';
export { MASH_PH_TARGET, MASH_PH_BAND, MASH_PH_TOLERANCE, mashPhStatus, mashPhVerdict, type MashPhStatus, type MashPhVerdict } from './mash';
export {
  LITRES_PER_US_GALLON,
  LITRES_PER_IMPERIAL_GALLON,
  KG_PER_LB,
  G_PER_OZ,
  litresToUsGallons,
  usGallonsToLitres,
  kgToLb,
  lbToKg,
  gToOz,
  ozToG,
  cToF,
  fToC,
  deltaCToF,
  deltaFToC,
} from './units';
export {
  formatGravity,
  formatVolume,
  formatKg,
  formatGrams,
  formatTemperature,
  formatAbv,
  formatFraction,
  formatMinutes,
  type GravityUnit,
  type UnitSystem,
} from './format';
export {
  tinsethUtilisation,
  ibuTinseth,
  buToGu,
  requireAlphaAcid,
  requireHopMinutes,
  ALPHA_ACID_MIN_PERCENT,
  ALPHA_ACID_MAX_PERCENT,
  HOP_MINUTES_MAX,
  WHIRLPOOL_EQUIVALENT_BOIL_MINUTES,
  type HopAddition,
  type IbuInput,
  type IbuEstimate,
} from './bitterness';
export {
  srmToEbc,
  ebcToSrm,
  maltEbcToLovibond,
  maltLovibondToEbc,
  maltColourUnits,
  moreySrmFromMcu,
  moreyColour,
  requireMaltColour,
  showColour,
  SRM_TO_EBC,
  MALT_COLOUR_MAX_LOVIBOND,
  BEER_COLOUR_MIN_SRM,
  BEER_COLOUR_MAX_SRM,
  MOREY_FIT_MAX_SRM,
  COLOUR_SCALES,
  type ColourScale,
  type GristColour,
  type ColourEstimate,
} from './colour';
