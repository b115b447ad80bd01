/** Side by side: pure comparison of two to four builds (design differences, figures, chart series). */
export { designDiff, type DiffRow, type PartNames } from "./design-diff";
export { figureTraces, withTraces } from "./figure-traces";
export { figureRows, warmupSeries, ladders, type FigureRow, type Judgement, type WarmupSeries, type LadderColumn } from "./figures";
