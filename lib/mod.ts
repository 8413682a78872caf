/**
 * tanklight — the designer's entry (`import … from "tanklight"`): coil builders, M/L/k, losses,
 * tanks and parts, loads, link, transient and, as they arrive, analysis, safety and reports.
 * Kernels and numerics (elliptic integrals, quadrature, LU, complex arithmetic, field kernels,
 * loss-model internals, input-guard helpers) live in `tanklight/advanced` (lib/advanced.ts).
 * Layers and the rule for which entry a name belongs to: docs/design.md §2 and §4.
 * Each layer keeps its own section below; add new names to your layer's section.
 */

// ── errors, constants, units ─────────────────────────────────────────────────
export { TanklightInputError, type InputIssue } from "./errors.ts";
export * from "./constants.ts";
export * from "./hazards.ts";
export {
  parseQuantity,
  formatQuantity,
  isQuantity,
  siUnit,
  DIMENSIONS,
  type Dimension,
  type DimensionInfo,
  type QuantityInput,
  type FormatOptions,
} from "./units.ts";

// ── lib/em ───────────────────────────────────────────────────────────────────
export type { Vec3, Pose, Filament, Conductor, Coil } from "./em/types.ts";
// coil builders, conductors and classic inductance formulas (builders)
export { roundCoil, RoundCoilSpec, type RoundCoilInput, type RoundCoil, type RoundCoilShape } from "./em/builders/roundCoil.ts";
export { solenoid, SolenoidSpec, type SolenoidInput, type Solenoid, type SolenoidShape } from "./em/builders/solenoid.ts";
export { flatSpiral, FlatSpiralSpec, type FlatSpiralInput, type FlatSpiral, type FlatSpiralShape } from "./em/builders/flatSpiral.ts";
export { rectSpiral, RectSpiralSpec, type RectSpiralInput, type RectSpiral, type RectSpiralShape } from "./em/builders/rectSpiral.ts";
export { rectLoop, RectLoopSpec, type RectLoopInput, type RectLoop, type RectLoopShape } from "./em/builders/rectLoop.ts";
export {
  roundWire,
  awgWire,
  litzWire,
  pcbTrace,
  copperWeightThickness,
  conductorFootprint,
  type RoundWire,
  type LitzWire,
  type PcbTrace,
  type RoundWireOptions,
  type LitzWireOptions,
} from "./em/builders/conductor.ts";
export type { CoilShape } from "./em/types.ts";
export {
  awgDiameter,
  currentSheetInductance,
  wheeler1982Inductance,
  wheelerSingleLayerInductance,
  wheelerMultilayerInductance,
  wheelerFlatSpiralInductance,
  mohanModifiedWheelerInductance,
  mohanCurrentSheetInductance,
  groverRectangleInductance,
  type SpiralOutline,
} from "./em/classicFormulas.ts";
// fields and inductance (EM core)
export { loopField, type LoopFieldValue } from "./em/loopField.ts";
export { coaxialLoopMutualInductance } from "./em/coaxialMutual.ts";
export { loopMutualInductance, type CircleFilament, type LoopMutualOptions } from "./em/loopMutual.ts";
export { magneticField } from "./em/magneticField.ts";
export {
  mutualInductance,
  mutualInductanceChecked,
  couplingFactor,
  type MutualInductanceResult,
} from "./em/mutualInductance.ts";
export {
  selfInductance,
  selfInductanceDetail,
  type SelfInductanceOptions,
  type SelfInductanceDetail,
} from "./em/selfInductance.ts";
export {
  couplingEvaluator,
  type CouplingEvaluator,
  type CouplingEvaluation,
  type CouplingEvaluatorOptions,
} from "./em/couplingEvaluator.ts";
// straight conductors in closed form (segments, polygons, circle–polygon)
export { straightFilamentMutual, polygonPairMutual } from "./em/straightMutual.ts";
export { circlePolygonMutual } from "./em/circlePolygonMutual.ts";
export { arrayCoupling, type ArrayCoupling, type ArrayTransmitter } from "./em/arrayCoupling.ts";
// losses, self-capacitance, quality factor (losses)
export { COPPER, ALUMINIUM, MATERIALS, material, resistivityAt, type Material } from "./em/materials.ts";
export { skinDepth } from "./em/losses/skinDepth.ts";
export { roundWireAcFactor } from "./em/losses/roundWireAcFactor.ts";
export {
  coilResistance,
  coilResistanceDetail,
  type CoilResistanceOptions,
  type CoilResistanceDetail,
} from "./em/losses/coilResistance.ts";
export { qualityFactor, qualityFactorDetail, type QualityFactorDetail } from "./em/losses/qualityFactor.ts";
export {
  selfCapacitance,
  selfCapacitanceDetail,
  selfResonance,
  type SelfCapacitanceDetail,
} from "./em/selfCapacitance.ts";

// ── lib/circuit ──────────────────────────────────────────────────────────────
export type { DiodeModel } from "./circuit/types.ts";
// parts and loads (tanks, E-series, dielectrics, LEDs, token loads)
export {
  resonantCapacitance,
  resonantFrequency,
  tankQuality,
  tankBandwidth,
  detuningTolerance,
  tuneWithStandardParts,
  type TuningChoice,
  type TankLosses,
  type TankQuality,
  type DetuningWindow,
} from "./circuit/tank.ts";
export { standardValues, standardValuesBetween, nearestStandardValue, SERIES_TOLERANCE, type ESeries } from "./circuit/eseries.ts";
export { bestCombination, type Combination, type CombinationOptions, type CombinationTopology, type PartKind } from "./circuit/combination.ts";
export { resonantFrequencyWindow, type ToleranceInput, type FrequencyWindow } from "./circuit/tolerance.ts";
export { capacitorStress, type CapacitorStress, type CapacitorStressInput } from "./circuit/stress.ts";
export {
  DIELECTRICS,
  VOLTAGE_RATINGS,
  dielectric,
  esrFromDissipationFactor,
  recommendCapacitor,
  type Dielectric,
  type DielectricData,
  type CapacitorRecommendation,
} from "./circuit/dielectrics.ts";
export {
  led,
  diode,
  fitShockley,
  type Led,
  type Diode,
  type Junction,
  type JunctionSpec,
  type JunctionOptions,
  type ForwardPoint,
  type ShockleyParameters,
} from "./circuit/loads/led.ts";
export { ledPreset, diodePreset, LED_PRESET_DATA, DIODE_PRESET_DATA, type LedColour, type DiodeKind, type LedPresetData, type PresetOptions } from "./circuit/loads/ledPresets.ts";
export type { TokenLoad, TokenLoadKind, LedCurrent } from "./circuit/loads/types.ts";
export { singleLed, antiParallelPair, sameDirectionPair, bridgeRectifier, halfWaveReservoir, resistorLoad } from "./circuit/loads/tokenCircuits.ts";
export {
  fundamentalConductance,
  loadResponse,
  averageLoadCurrent,
  type FundamentalResponse,
} from "./circuit/loads/describingFunction.ts";
export {
  reservoirSteadyState,
  currentFedBridge,
  steigerwaldEquivalentResistance,
  type ReservoirState,
  type CurrentFedBridgeResult,
} from "./circuit/loads/rectifier.ts";
export { tokenResponse, type TokenResponse, type TokenResponseInput } from "./circuit/loads/tokenResponse.ts";
// link: drives, coupled tanks, operating point
export {
  sineDrive,
  halfBridgeDrive,
  fullBridgeDrive,
  currentDrive,
  parallelTankDrive,
  classEDesign,
  classEDrive,
  CLASS_E,
  type DriveEquivalent,
  type ClassEDesign,
} from "./circuit/drive.ts";
export { solveLink, linkNetwork, type LinkSystem, type LinkSolution, type LinkNetworkBuild, type SolveLinkOptions } from "./circuit/link.ts";
export { solveLinkNetwork, LinkConvergenceError } from "./circuit/link/solveNetwork.ts";
export { summarizeLink, type LinkSummary, type LinkSummaryRow } from "./circuit/link/summary.ts";
export {
  solveLinkSequence,
  FLICKER_FUSION_RATE,
  type LinkSequence,
  type LinkSequenceResult,
  type SequenceStep,
  type SequenceReceiver,
  type SequenceTransmitter,
  type SequenceLed,
} from "./circuit/link/sequence.ts";
export {
  DEFAULT_LIT_THRESHOLD,
  type LinkNetwork,
  type LinkOptions,
  type LinkLoadModel,
  type TransmitterNetwork,
  type ReceiverNetwork,
  type SharedDriveNetwork,
} from "./circuit/link/network.ts";
export type { LinkResult, TransmitterState, ReceiverState, LedState, LinkPower, Phasor, DriveState } from "./circuit/link/result.ts";
export { maxLinkEfficiency, optimalLoad } from "./circuit/linkLimits.ts";
export { frequencySweep, type FrequencySweep, type SweepFrequencies } from "./circuit/frequencySweep.ts";
// steady state beyond the fundamental: harmonic balance, model choice (issue 14)
export {
  solveLinkHarmonic,
  DEFAULT_HARMONIC_ORDER,
  type HarmonicOptions,
  type HarmonicLinkResult,
  type HarmonicDetail,
} from "./circuit/harmonic/solveHarmonic.ts";
export {
  solveLinkModel,
  FUNDAMENTAL_ACCEPT,
  type LinkModel,
  type ModelOptions,
  type ModelledLinkResult,
} from "./circuit/harmonic/modelChoice.ts";
export type { ModelBand } from "./circuit/harmonic/modelBand.ts";
export type { DriveWaveform } from "./circuit/drive.ts";
export { periodicSteadyState, type ShootingOptions, type ShootingResult } from "./circuit/transient/shooting.ts";
// end steady state
// transient: time-domain engine
export {
  GROUND,
  type TransientCircuit,
  type CircuitElement,
  type ResistorElement,
  type CapacitorElement,
  type InductorElement,
  type CouplingElement,
  type VoltageSourceElement,
  type CurrentSourceElement,
  type SwitchElement,
  type DiodeElement,
  type Waveform,
} from "./circuit/transient/circuit.ts";
export { simulate, voltageBetween, type SimulateOptions, type TransientResult, type SteadyState } from "./circuit/transient/simulate.ts";
export { TransientConvergenceError } from "./circuit/transient/errors.ts";
export { sineWaveform, stepWaveform, periodicGate } from "./circuit/transient/waveforms.ts";
export { waveformHarmonics, type Harmonics } from "./circuit/transient/harmonics.ts";
export { singleSwitchDrive, bridgeDrive, type DriveCircuit, type SingleSwitchDriveSpec, type BridgeDriveSpec } from "./circuit/transient/drives.ts";
export { addToken, type TokenSpec, type TokenCircuit } from "./circuit/transient/token.ts";

// ── lib/safety ───────────────────────────────────────────────────────────────
export { SafetyDesignInput, designFromLink, type SafetyDesign, type SafetyDesignParsed, type DesignFromLinkOptions } from "./safety/design.ts";
export { RMS_CONVENTION } from "./safety/rms.ts";
export {
  EXPOSURE_STANDARDS,
  referenceLevel,
  basicRestriction,
  type Population,
  type ExposureStandardId,
  type ExposureStandard,
  type ReferenceLevel,
  type BasicRestriction,
  type SourceStatus,
} from "./safety/referenceLevels.ts";
export {
  exposureCheck,
  DEFAULT_DISCS,
  DISC_MODEL,
  type ExposureOptions,
  type ExposureCheck,
  type ReferenceLevelVerdict,
  type BasicRestrictionVerdict,
} from "./safety/exposure.ts";
export {
  emissionEstimate,
  dipoleField,
  FREE_SPACE_IMPEDANCE,
  EMISSION_DISTANCES,
  DIPOLE_MODEL,
  type EmissionEstimate,
  type EmissionVerdict,
  type FieldAtDistance,
} from "./safety/emission.ts";
export { EMISSION_RULES, emissionRows, type EmissionRule, type EmissionRow } from "./safety/emissionLimits.ts";
export { metalHeating, OBJECT_METALS, MetalObjectInput, type MetalObject, type MetalHeating } from "./safety/metalHeating.ts";
export {
  componentStress,
  WINDING_TEMPERATURE_MODEL,
  type ComponentStress,
  type TransmitterStress,
  type ReceiverStress,
} from "./safety/componentStress.ts";
export { checkRating, TYPICAL_INDICATOR_LED, WINDING_CURRENT_DENSITY, type RatingCheck } from "./safety/partRatings.ts";
export { cautions, type Caution, type CautionContext } from "./safety/cautions.ts";
export { safetyReport, DEFAULT_METAL_OBJECTS, type SafetyReport, type SafetyReportOptions } from "./safety/safetyReport.ts";

// ── lib/analysis ─────────────────────────────────────────────────────────────
// coverage maps, range, supply budget, worker threads
export {
  coverageMap,
  type CoverageMap,
  type CoverageOptions,
  type DeadZone,
} from "./analysis/coverageMap.ts";
export { findRange, type RangeResult, type RangeOptions, type RangePoint, type RayInput } from "./analysis/findRange.ts";
export type { ModelStatement } from "./analysis/probe.ts";
export { type RegionInput, type OrientationInput, type GridAxis } from "./analysis/region.ts";
export {
  supplyBudget,
  supplyVerdict,
  USB_SUPPLIES,
  SUPPLY_DERATING,
  type SupplyInput,
  type SupplyVerdict,
  type SupplyBudget,
  type UsbSupply,
} from "./analysis/supplyBudget.ts";
export type { Progress, ProgressCallback } from "./analysis/progress.ts";
export { taskPool, type TaskPool, type ThreadsOption } from "./analysis/pool.ts";
export {
  toleranceYield,
  type YieldOptions,
  type YieldResult,
  type Percentiles,
  type SensitivityEntry,
} from "./analysis/toleranceYield.ts";
export { VariationsInput, LED_SPREAD_PRESETS } from "./analysis/yieldSpec.ts";
export { wilsonInterval, type ProportionInterval } from "./analysis/confidence.ts";
export {
  searchDesign,
  RequirementsInput,
  DesignSpaceInput,
  type SearchOptions,
  type DesignSearch,
  type DesignResult,
} from "./analysis/searchDesign.ts";
export type { Candidate, DesignEvaluation, Layout, Phasing, Constraint } from "./analysis/designEval.ts";

// ── lib/report ───────────────────────────────────────────────────────────────
/** Chart builders returning vega-lite specs: `chart.coverage(…)`, `chart.ledCurrent(…)`, … (lib/report/chart.ts). */
export * as chart from "./report/chart.ts";
export type { ChartSpec } from "./report/chart.ts";
export { renderSvg, type RenderOptions } from "./report/renderSvg.ts";
export { PALETTE, ledSwatch } from "./report/theme.ts";
export { notebook, DEFER_LINE, type Notebook, type NotebookOptions, type Cell, type Quantity, type TableValue } from "./report/notebook.ts";
export { partsList, partVoltages, wireText, type PartRow, type PartsInput, type CapacitorBuild } from "./report/partsList.ts";
export { notebookMarkdown } from "./report/markdown.ts";
export { notebookHtml } from "./report/html.ts";
export { notebookText } from "./report/terminal.ts";
export { renderNotebook, writeNotebook, type RenderedNotebook } from "./report/write.ts";
export { tokenLoadLine, type LoadLine, type LoadLineInput } from "./report/loadLine.ts";
export { DesignFile, parseDesign, parseDesignText, designJsonSchema, DESIGN_FILE_MAX_BYTES, type Design, type DesignFileInput } from "./report/designFile.ts";
export { designReport, type DesignResults } from "./report/designReport.ts";
export { addSafetySections, type FieldMapInput } from "./report/safetySection.ts";
// end report

// ── lib/analysis: calibration from bench measurements ────────────────────────
export {
  calibrate,
  predictToken,
  predictRange,
  drivePlausibility,
  MeasurementInput,
  type Measurement,
  type CalibrationUnknown,
  type CalibrateOptions,
  type Calibration,
  type CalibratedParameter,
  type CalibrationResidual,
  type PredictOptions,
  type PredictedQuantity,
  type TokenChoice,
} from "./analysis/calibrate.ts";
export { CalibrationDesignInput, type CalibrationDesign, type CalibrationParameters } from "./analysis/calibrationModel.ts";
