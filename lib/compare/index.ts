/** Side by side: pure comparison of two to four builds (design differences, figures, chart series, the summary). */
export { designDiff, columnNamesFor, type DiffRow, type PartNames } from "./design-diff";
export { figureTraces, limitTraces, summaryWithTraces, withTraces } from "./figure-traces";
export { figureRows, warmupSeries, ladders, type FigureRow, type Judgement, type WarmupSeries, type LadderColumn } from "./figures";
export { summarise, listWords, type ComparisonSummary, type ScenarioSummary, type VariantCell, type DecidingLimit, type SharedLimit, type SummaryInput, type EvaluationLike } from "./summary";
export { SIGNIFICANCE, significantlyDifferent, significanceWords } from "./significance";
export * as compareFormat from "./format";
export { sideBySide, type ScenarioSideBySide, type PlaceLadder, type HeatPathColumn } from "./heat-paths";
