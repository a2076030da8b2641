export type { NumericTable, ParsedTable, TableColumn } from "./table/types.ts";
export { parseCsvText } from "./table/parseCsvText.ts";
export { parseNumber, isMissingToken } from "./table/parseNumber.ts";
export { selectFeatures, type FeatureSelection } from "./table/selectFeatures.ts";
export { zScore, type ScaledTable } from "./scale/zScore.ts";
export { minMax } from "./scale/minMax.ts";
export { robust } from "./scale/robust.ts";
export { scaleTable } from "./scale/scaleTable.ts";
export type { Metric, MetricName } from "./metric/types.ts";
export { euclidean } from "./metric/euclidean.ts";
export { manhattan } from "./metric/manhattan.ts";
export { chebyshev } from "./metric/chebyshev.ts";
export { cosine } from "./metric/cosine.ts";
export { correlation } from "./metric/correlation.ts";
export { metrics, metricNames, maybeMetric } from "./metric/metrics.ts";
export { greedyNet } from "./landmark/greedyNet.ts";
export { maximinNet } from "./landmark/maximinNet.ts";
export { chooseLandmarks } from "./landmark/chooseLandmarks.ts";
export { ballMembership, rowsToNodes, type CompressedLists } from "./graph/ballMembership.ts";
export { overlapEdges, type EdgeList } from "./graph/overlapEdges.ts";
export { components, type Components } from "./graph/components.ts";
export { nerveTriangles } from "./graph/nerveTriangles.ts";
export { nerveBetti, type NerveBetti } from "./graph/nerveBetti.ts";
export { buildCover, type BuildOptions, type BuildPhase, type CoverResult } from "./cover/buildCover.ts";
export {
  landmarkRules,
  scaleNames,
  missingPolicies,
  maybeLandmarkRule,
  maybeScale,
  maybeMissingPolicy,
  type CoverParams,
  type LandmarkRule,
  type ScaleName,
  type MissingPolicy,
} from "./cover/params.ts";
export { suggestRadius, type RadiusBasis } from "./cover/suggestRadius.ts";
export { excludeUndefinedRows } from "./cover/excludeUndefinedRows.ts";
export { nodeMeans, nodeMembers } from "./cover/nodeMeans.ts";
export { mean } from "./stats/mean.ts";
export { sampleVariance } from "./stats/sampleVariance.ts";
export { quantileSorted } from "./stats/quantileSorted.ts";
export { columnSummary, type ColumnSummary } from "./stats/columnSummary.ts";
export { standardisedDifference } from "./stats/standardisedDifference.ts";
export { coverExports, exportSchemaVersion, type CoverExports, type ExportContext } from "./export/coverExports.ts";
export { zipExports } from "./export/zipExports.ts";
export { csvNumber, csvText, csvLine } from "./export/csvCell.ts";
export { randomSource, shuffledOrder } from "./random.ts";
