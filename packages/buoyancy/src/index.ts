export { ENGINE_VERSION } from './version.js';
export { ComputationError, InputError } from './errors.js';
export type { InputIssue, InputRange } from './errors.js';
export type {
  CalculationResult,
  CalculationWarning,
  DataSeries,
  DerivationStep,
  OutputQuantity,
  Quantity,
  SubstitutedValue,
  WarningSeverity,
} from './derivation.js';
export {
  AIR_PRESSURE_RANGE_PA,
  AIR_TEMPERATURE_RANGE_K,
  dryAirDensityKgM3,
} from './atmosphere/air-density.js';
export {
  geometricAltitudeM,
  geopotentialAltitudeM,
  gravityAtAltitudeMS2,
  STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M,
  standardAltitudeForPressureM,
  standardAtmosphere,
  TEMPERATURE_OFFSET_RANGE_K,
} from './atmosphere/standard-atmosphere.js';
export type {
  StandardAtmosphereOptions,
  StandardAtmosphereState,
} from './atmosphere/standard-atmosphere.js';
export * from './constants.js';
export {
  describeKind,
  evaluate,
  evaluateKind,
  isKindId,
  KIND_IDS,
  kindCapabilities,
  KINDS,
  normaliseInputs,
} from './kinds/registry.js';
export type { EvaluateOptions, KindDescription, KindId } from './kinds/registry.js';
// What a new kind is made of (DEVELOPERS.md, "Add a calculation kind").
export { defineKind } from './kinds/kind.js';
export type { CalculationKind } from './kinds/kind.js';
export { Derivation } from './derivation.js';
export { quantity } from './schema/quantity-schema.js';
export type { KindCapabilities, KindChart } from './kinds/kind.js';
export {
  applyLibraryEnvelope,
  LIBRARY_ENVELOPE_MAPPINGS,
  libraryEnvelopeMapping,
} from './library/apply-library-envelope.js';
export type { LibraryEnvelopeMapping } from './library/apply-library-envelope.js';
export { LIBRARY_ENVELOPE_KINDS, LIBRARY_ENVELOPE_RANGES } from './library/library-envelope.js';
export type { LibraryEnvelope, LibraryEnvelopeKind } from './library/library-envelope.js';
export { CHECK_THIS, plausibilityNotes } from './schema/plausibility.js';
export { USUAL } from './schema/usual-ranges.js';
export type { LiftCheckInput } from './kinds/lift-check.kind.js';
export { GAS_CATALOGUE, GAS_IDS } from './gas/gas-catalogue.js';
export type { GasHazard, GasId, LiftingGas } from './gas/gas-catalogue.js';
export { gasDensity, idealGasDensityKgM3 } from './gas/lifting-gas-density.js';
export type { GasDensityInput, GasState } from './gas/lifting-gas-density.js';
export {
  moistAirDensity,
  moistAirDensityKgM3,
  vapourMoleFractionFromDewPoint,
  vapourMoleFractionFromRelativeHumidity,
} from './atmosphere/moist-air-density.js';
export {
  enhancementFactor,
  saturationVapourPressurePa,
} from './atmosphere/saturation-vapour-pressure.js';
export {
  capsuleGeometry,
  cushionGeometry,
  cushionThicknessM,
  envelopeGeometry,
  sphereGeometry,
  spheroidGeometry,
} from './envelope/envelope-geometry.js';
export type { EnvelopeGeometry, EnvelopeShape } from './envelope/envelope-geometry.js';
export { liftMasses } from './steps/lift-steps.js';
export type { LiftMasses } from './steps/lift-steps.js';
export { findRoot } from './numerics/find-root.js';
export {
  convertFromSI,
  formatQuantity,
  parseCount,
  parseQuantity,
  readQuantity,
} from './units/quantity-text.js';
export { EDIT_SIGNIFICANT_DIGITS, plainEditText, quantityEditText } from './units/edit-text.js';
export type {
  FormattedQuantity,
  QuantityReading,
  QuantityReadOptions,
} from './units/quantity-text.js';
export {
  formatNumber,
  isNumberFormat,
  NUMBER_FORMAT_IDS,
  NUMBER_FORMATS,
} from './units/number-format.js';
export type { NumberDisplayOptions, NumberFormat } from './units/number-format.js';
export { readLeadingNumber, readNumber } from './units/number-text.js';
export type { NumberReading } from './units/number-text.js';
export { parseMoney } from './units/money-text.js';
export type { MoneyReadOptions } from './units/money-text.js';
export {
  fieldLabel,
  formatRange,
  humaniseKey,
  inputFieldInfo,
  readableIssue,
} from './schema/field-info.js';
export type { InputFieldInfo, ReadableOptions } from './schema/field-info.js';
export {
  choiceTitle,
  describeInputs,
  fieldSchemaAt,
  inputLabel,
  inputValueText,
  sharedUnit,
} from './schema/input-text.js';
export type { InputLine, InputSection, InputTextOptions } from './schema/input-text.js';
export { DIMENSIONS, dimensionOfSIUnit, DISPLAY_UNITS } from './units/dimensions.js';
export type { Dimension, UnitSystem } from './units/dimensions.js';
export { envelopeSizingKind } from './kinds/envelope-sizing.kind.js';
export type { EnvelopeSizingInput } from './kinds/envelope-sizing.kind.js';
export { fastLift, sweepSphereDiameter } from './lift/fast-lift.js';
export type { DiameterSweepPoint, FastLiftInput } from './lift/fast-lift.js';
export { ambientAirNumbers, gasDensityInAirKgM3 } from './lift/lift-conditions.js';
export type { AirNumbers } from './lift/lift-conditions.js';
export { liftSweeps, SWEEP_INTERVALS } from './lift/lift-sweeps.js';
export type { LiftSweep, LiftSweepId, SweepOutputs, SweepPoint } from './lift/lift-sweeps.js';
export { sweepPlot } from './lift/sweep-plot.js';
export type { PlotAxis, SweepPlot } from './lift/sweep-plot.js';
export { niceAxis, tickDecimals } from './units/nice-axis.js';
export { flightProfileKind } from './kinds/flight-profile.kind.js';
export type { FlightProfileInput } from './kinds/flight-profile.kind.js';
export { JURISDICTION_PROFILES } from './rules/jurisdiction-profiles.js';
export type { JurisdictionProfile, RuleThreshold } from './rules/jurisdiction-profiles.js';
export { HYDROGEN_HHV_J_PER_KG, hydrogenMolarRateMolPerS } from './supply/electrolysis.js';
export {
  CYLINDER_COMPRESSIBILITY,
  cylinderCompressibility,
  cylinderDeliverableMol,
} from './supply/cylinder.js';
export type { CompressibilityModel } from './supply/compressibility-model.js';
export { heliumCompressibility } from './supply/helium-compressibility.js';
export { hydrogenCompressibility } from './supply/hydrogen-compressibility.js';
export { fitLiftRetention } from './measurement/lift-retention.js';
export type { LiftReading, RetentionFit } from './measurement/lift-retention.js';
export { kindsMarkdown } from './kinds/kinds-markdown.js';
export {
  DEFAULT_BALLOON_DRAG_COEFFICIENT,
  DEFAULT_PARACHUTE_DRAG_COEFFICIENT,
} from './flight/drag-defaults.js';
export {
  diffInputs,
  diffOutputs,
  sameResult,
  SAME_RESULT_RELATIVE,
} from './compare/result-diff.js';
export type { InputChange, OutputChange } from './compare/result-diff.js';
export { fillDesignFromVersion, reduceFillLog } from './measurement/fill-log.js';
export { INSTRUMENT_DEFAULTS } from './kinds/lift-measurement.kind.js';
export type { LiftInstrument } from './kinds/lift-measurement.kind.js';
export type {
  FillAmbient,
  FillDesign,
  FillLogReduction,
  FillReading,
} from './measurement/fill-log.js';
export { planGas } from './plan/gas-plan.js';
export type { GasPlan, GasPlanInput, GasPlanLine } from './plan/gas-plan.js';
export type { GasSupplyInput } from './kinds/gas-supply.kind.js';
export { meterEnergy } from './supply/meter-energy.js';
export type { MeterEnergy, MeterLog } from './supply/meter-energy.js';
export { checkExerciseAnswers } from './teach/exercise-check.js';
export type { AnswerCheck, ExerciseCheck } from './teach/exercise-check.js';
export { isWithheldValue, withheldByDerivation } from './teach/withhold.js';
export type { Withheld } from './teach/withhold.js';
export {
  numberAtPath,
  numericInputPaths,
  valuesOutsideRanges,
  withNumberAtPath,
} from './teach/input-paths.js';
export type { InputRangeLimit } from './teach/input-paths.js';
export {
  prepareWindProfile,
  windAboveProfileNote,
  windAt,
  windBelowProfileNote,
  windComponentsMS,
  windDirectionAndSpeed,
  windProfile,
  windProfileAirAt,
} from './wind/wind-profile.js';
export type { AirSample, ProfilePosition, WindProfile, WindSample } from './wind/wind-profile.js';
export {
  WIND_DEW_POINT_RANGE_K,
  WIND_HEIGHT_RANGE_M,
  WIND_LAYER_COUNT_RANGE,
  WIND_PRESSURE_RANGE_PA,
  WIND_SPEED_RANGE_MS,
  WIND_TEMPERATURE_RANGE_K,
  windLayerSchema,
  windProfileSchema,
} from './wind/wind-profile-schema.js';
export type {
  HeightSource,
  WindLayerInput,
  WindLayerValues,
  WindProfileInput,
  WindProfileValues,
} from './wind/wind-profile-schema.js';
export { readWindProfile } from './wind/read-wind-profile.js';
export type {
  BadWindLine,
  WindColumn,
  WindColumnMapping,
  WindProfileReading,
} from './wind/read-wind-profile.js';
export {
  WIND_HEIGHT_UNITS,
  WIND_PRESSURE_UNITS,
  WIND_SPEED_UNITS,
  WIND_TEMPERATURE_UNITS,
} from './wind/wind-units.js';
export type {
  WindHeightUnit,
  WindPressureUnit,
  WindSpeedUnit,
  WindTemperatureUnit,
} from './wind/wind-units.js';
export {
  hypsometricHeightM,
  layerMeanTemperatureK,
  virtualTemperatureK,
} from './wind/hypsometric.js';
export { flightPath } from './flight/flight-path.js';
export type { FlightPath, FlightPathPoint } from './flight/flight-path.js';
export {
  DRIFT_MAX_STEP_RANGE_S,
  driftTrack,
  LAUNCH_ALTITUDE_RANGE_M,
  LAUNCH_LATITUDE_RANGE_DEG,
} from './flight/drift.js';
export type { DriftInput, DriftPoint, DriftResult, LaunchSite } from './flight/drift.js';
export { TRACK_LATITUDE_LIMIT_DEG, wgs84Inverse, wgs84RadiiOfCurvature } from './flight/geodesy.js';
export type { GeodesicInverse } from './flight/geodesy.js';
export { flightDrift, LANDING_REGION_PROBABILITIES, landingArea } from './landing/landing-area.js';
export type { LandingAreaOptions } from './landing/landing-area.js';
export {
  DEFAULT_LANDING_SPREADS,
  LANDING_RUNS_RANGE,
  MAX_LANDING_SPREAD,
} from './landing/landing-spreads.js';
export type {
  GroundPoint,
  LandingArea,
  LandingRegion,
  LandingRun,
  LandingSpreads,
} from './landing/landing-area-types.js';
export {
  continuations,
  continueInputs,
  needsLeft,
  takeContinuedFields,
  type ContinuationDraft,
  type ContinuationTarget,
  type SourceOutputs,
  type TakenFields,
} from './chain/index.js';
export {
  checkFillCardOptions,
  FILL_CARD_NORMAL_CONDITIONS,
  FILL_CARD_RANGES,
  fillCard,
  fillCardStopText,
  NECK_LIFT_SOURCE,
} from './fill-card/index.js';
export type {
  FillCard,
  FillCardCaution,
  FillCardCylinderOptions,
  FillCardCylinders,
  FillCardOptions,
} from './fill-card/index.js';
export { flightGeoJson, flightGeoJsonText } from './exports/flight-geojson.js';
export type {
  GeoJsonFeature,
  GeoJsonFeatureCollection,
  GeoJsonGeometry,
  GeoJsonPosition,
} from './exports/flight-geojson.js';
export { flightKml } from './exports/flight-kml.js';
export { flightGpx } from './exports/flight-gpx.js';
export type { FlightGeography } from './exports/flight-geography.js';
export { flightProfileTable, PROFILE_HEADERS } from './exports/profile-table.js';
export type { ProfileCell, ProfileColumn, ProfileTable } from './exports/profile-table.js';
