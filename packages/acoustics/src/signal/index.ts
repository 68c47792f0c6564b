/** Signal processing: band analysis of recordings, events, spectrum files. */
export { BandAnalyzer, FAST_TIME_CONSTANT_S, TICKS_PER_SECOND } from "./band-analyzer.js";
export type { BandAnalysis, BandAnalyzerOptions, BandSnapshot, LevelHistory } from "./band-analyzer.js";
export { detectEvents } from "./events.js";
export type { EventOptions, NoiseEvent } from "./events.js";
export { parseSpectrumCsv, spectrumToCsv, nominalBandOf } from "./spectrum-csv.js";
export type { CsvSeparator, SpectrumCsvProblem, SpectrumCsvResult, SpectrumCsvRow } from "./spectrum-csv.js";
export { butterworthBandPass, butterworthLowPass, sectionsResponse, Cascade } from "./butterworth.js";
export type { Section } from "./butterworth.js";
export { LevelHistogram } from "./level-histogram.js";
export { seededRandom, gaussian, sineSamples, whiteNoise, pinkNoise } from "./test-signals.js";
