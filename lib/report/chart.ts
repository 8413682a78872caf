/**
 * Chart builders: each takes plain SI data and returns a vega-lite spec with units on every
 * axis and tanklight's own palette (lib/report/theme.ts). Render with `renderSvg(spec)`.
 * Re-exported as the `chart` namespace: `chart.coverage(…)`, `chart.ledCurrent(…)`, …
 */
export { coverageChart as coverage, type CoverageChartInput } from "./charts/coverage.ts";
export { couplingChart as coupling, type CouplingChartInput, type CouplingCurve } from "./charts/coupling.ts";
export { ledCurrentChart as ledCurrent, type LedCurrentChartInput, type LedCurrentCurve } from "./charts/ledCurrent.ts";
export { loadLineChart as loadLine, type LoadLineChartInput } from "./charts/loadLine.ts";
export { waveformChart as waveform, spectrumChart as spectrum, type WaveformChartInput, type SpectrumChartInput } from "./charts/waveform.ts";
export { yieldHistogramChart as yieldHistogram, type YieldHistogramInput } from "./charts/yieldHistogram.ts";
export { exposureChart as exposure, type ExposureChartInput } from "./charts/exposure.ts";
export { tradeoffChart as tradeoff, paretoFront, type TradeoffChartInput, type TradeoffPoint } from "./charts/tradeoff.ts";
export { measuredPredictedChart as measuredPredicted, type MeasuredPredictedInput } from "./charts/measuredPredicted.ts";
export type { ChartSpec } from "./charts/spec.ts";
