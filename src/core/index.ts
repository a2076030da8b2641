export type { NumericTable, ParsedTable, TableColumn, Categories, ColumnType } from "./table/types.ts";
export { createTableReader, type TableReader } from "./table/createTableReader.ts";
export { readTableText } from "./table/readTableText.ts";
export { readTableBytes, readChunkBytes, type ByteSource, type ByteReadOptions, type ByteReadControl, type Utf8Decoder } from "./table/readTableBytes.ts";
export {
  delimiters,
  delimiterNames,
  delimiterLabels,
  maxInputBytes,
  distinctCap,
  numericShare,
  maybeDelimiter,
  maybeDecimalMark,
  maybeRaggedPolicy,
  type Delimiter,
  type DelimiterName,
  type DecimalMark,
  type RaggedPolicy,
  type ReadOptions,
} from "./table/readOptions.ts";
export type { ReadOutcome, TableReport, ColumnReport, FlaggedCell, Notice, TableFormat } from "./table/tableReport.ts";
export { checkInputSize } from "./table/checkInputSize.ts";
export { oneHot } from "./table/oneHot.ts";
export { categoryCounts, majorityLevel } from "./table/categoryCounts.ts";
export { cellText } from "./table/cellText.ts";
export { detectEncoding, maybeEncoding, encodingProbeBytes, type TextEncodingName } from "./encoding/detectEncoding.ts";
export { decodeWindows1252 } from "./encoding/decodeWindows1252.ts";
export { readParquet } from "./table/parquet/readParquet.ts";
export { isParquet } from "./table/parquet/isParquet.ts";
export { parseCsvText } from "./table/parseCsvText.ts";
export { parseNumber, isMissingToken } from "./table/parseNumber.ts";
export { selectFeatures, type FeatureSelection, type MissingReport } from "./table/selectFeatures.ts";
export { zScore } from "./scale/zScore.ts";
export type { ScaledTable } from "./scale/columnTransform.ts";
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
export { visitOrder } from "./landmark/visitOrder.ts";
export { netWithBalls, landmarkBalls, type Balls, type NetWithBallsOptions } from "./landmark/netWithBalls.ts";
export { rowsToNodes, transposeLists, type CompressedLists } from "./lists/compressedLists.ts";
export { ballMembership } from "./search/ballMembership.ts";
export { overlapEdges, overlapEdgesPart, type EdgeList } from "./nerve/overlapEdges.ts";
export { edgeCuts, joinEdgeLists } from "./nerve/edgeParts.ts";
export { components, type Components } from "./nerve/components.ts";
export { nerveTriangles } from "./nerve/nerveTriangles.ts";
export { nerveBetti, type NerveBetti } from "./nerve/nerveBetti.ts";
export { buildCover, coverSteps, type CoverSteps, type PartRequest, type BuildOptions, type BuildPhase, type CoverResult } from "./cover/buildCover.ts";
export { buildCoverOnThreads } from "./cover/buildCoverOnThreads.ts";
export { answerPart, answerTransferables, runCoverPart, type CoverTask, type PartAnswer, type PartMessage, type PartOutput, type PartRange } from "./cover/coverParts.ts";
export { createPartRunner, type HelperThread, type PartRunner, type PartRunnerOptions } from "./cover/partRunner.ts";
export {
  landmarkRules,
  scaleNames,
  missingPolicies,
  maybeLandmarkRule,
  maybeScale,
  maybeMissingPolicy,
  featureWeights,
  type CoverParams,
  type LandmarkRule,
  type ScaleName,
  type MissingPolicy,
} from "./params.ts";
export { defaultRadius, type RadiusBasis } from "./radius/defaultRadius.ts";
export { logBisect, type Bisection } from "./radius/logBisect.ts";
export { roundUpSignificant } from "./radius/roundUpSignificant.ts";
export { farthestFromFirst } from "./radius/farthestFromFirst.ts";
export { excludeUndefinedRows } from "./scale/excludeUndefinedRows.ts";
export type { CoverGraph } from "./cover/coverGraph.ts";
export { prepareFeatures, type PreparedFeatures } from "./scale/prepareFeatures.ts";
export { nodeMeans, nodeMembers } from "./cover/nodeMeans.ts";
export { nodeMajority, nodeLevelShare } from "./cover/nodeCategories.ts";
export { mean } from "./stats/mean.ts";
export { sampleVariance } from "./stats/sampleVariance.ts";
export { quantileSorted } from "./stats/quantileSorted.ts";
export { columnSummary, type ColumnSummary } from "./stats/columnSummary.ts";
export { standardisedDifference } from "./stats/standardisedDifference.ts";
export { coverExports, coverSummary, exportSchemaVersion, type CoverExports, type ExportContext, type ReadingRecord } from "./export/coverExports.ts";
export { coverExportChunks, exportChunkLength, piecesText, type CoverExportChunks, type ExportColumns, type ExportPiece } from "./export/coverExportChunks.ts";
export { asciiLines } from "./export/asciiLines.ts";
export { readingRecord } from "./export/readingRecord.ts";
export { zipExports } from "./export/zipExports.ts";
export { csvNumber, csvText, csvLine, csvQuoted } from "./export/csvCell.ts";
export { randomSource, shuffledOrder } from "./random.ts";
export { Cancelled, isCancelled } from "./control.ts";
export { radiusSweep, sweepPrepared, defaultSweepSteps, type RadiusSweep, type SweepOptions } from "./sweep/radiusSweep.ts";
export type { SweepFigures } from "./sweep/sweepFigures.ts";
export type { Plateau } from "./radius/plateaus.ts";
export type { PlateauMiddle } from "./radius/plateauMiddle.ts";
export type { SweepParams } from "./search/prepareRows.ts";
export { regionStability, type RegionTrack } from "./stability/regionStability.ts";
export { seedStability, defaultSeedCount, type SeedStability, type Spread } from "./stability/seedStability.ts";
export { prepareRows, type PreparedRows } from "./search/prepareRows.ts";
export { defaultRange, defaultRangeRule, type RadiusRange, type RangeOptions } from "./radius/defaultRange.ts";
export { logSpacedRadii, ascendingRadii } from "./sweep/logSpacedRadii.ts";
export { plateaus } from "./radius/plateaus.ts";
export { plateauMiddle, plateauMiddleRule } from "./radius/plateauMiddle.ts";
export { figureBuffers } from "./sweep/sweepFigures.ts";
export { nerveLoops, type LoopCounts } from "./nerve/nerveLoops.ts";
export { matchRegion, type RegionMatch } from "./stability/matchRegion.ts";
export { selectionMask } from "./stability/selectionMask.ts";
export { createRowIndex, maybeRowIndex, type RowIndex, type RowIndexOptions } from "./search/rowIndex.ts";
export { ballRows } from "./search/ballRows.ts";
export { greedyBalls, type GreedyBallsOptions, type NetWithBalls } from "./landmark/greedyBalls.ts";
export { maximinBalls, type MaximinBallsOptions } from "./landmark/maximinBalls.ts";
export { blockMembership } from "./search/blockMembership.ts";
export { indexFromParts, indexParts, type IndexParts, type ShareArray } from "./search/indexParts.ts";
export { ksStatistic } from "./stats/ksStatistic.ts";
export { ksPValue } from "./stats/ksPValue.ts";
export { benjaminiHochberg } from "./stats/benjaminiHochberg.ts";
export { cohensD } from "./stats/cohensD.ts";
export { chiSquaredIndependence, type ChiSquaredIndependence } from "./stats/chiSquaredIndependence.ts";
export { nodeRows } from "./regions/nodeRows.ts";
export { regionSides, type RegionSides } from "./regions/regionSides.ts";
export { compareNumeric, type NumericComparison } from "./regions/compareNumeric.ts";
export { compareCategorical, type CategoricalComparison } from "./regions/compareCategorical.ts";
export { regionTable, type RegionTable, type RegionTableLine, type RegionTableOptions } from "./regions/regionTable.ts";
export { readRecordTexts, type RecordTextOptions } from "./table/readRecordTexts.ts";
export { regionRowsCsv, type Region } from "./export/regionRowsCsv.ts";
export { regionTableCsv, regionTableHeader } from "./export/regionTableCsv.ts";
export { graphml, type GraphmlContext } from "./export/graphml.ts";
export { nodeRowShare } from "./cover/nodeRowShare.ts";
export { numericLevels } from "./table/numericLevels.ts";
export { componentNodes } from "./regions/componentNodes.ts";
export { growByOneStep } from "./regions/growByOneStep.ts";
export { majorityNodes } from "./regions/majorityNodes.ts";
export { sharedRowCount } from "./regions/sharedRowCount.ts";
export { nodesHoldingRow } from "./regions/nodesHoldingRow.ts";
export type { Hotspot, HotspotDirection, HotspotOptions, HotspotScan, HotspotScore, HotspotSearch } from "./hotspots/types.ts";
export { scanHotspots } from "./hotspots/scanHotspots.ts";
export { countCandidateSets } from "./hotspots/countCandidateSets.ts";
export { hotspotDefaults } from "./hotspots/hotspotDefaults.ts";
export { bernoulliScore } from "./hotspots/bernoulliScore.ts";
export { normalScore } from "./hotspots/normalScore.ts";
export { rankScore, midranks } from "./hotspots/rankScore.ts";
export { monteCarloP } from "./hotspots/permutationMaxima.ts";
export { jaccardRows } from "./hotspots/jaccardRows.ts";
export { recipeSchemaVersion, type Recipe, type RecipeInput, type RecipeReading, type RecipeColumns, type RecipeColour, type RecipeRegion, type RecipeHotspots } from "./recipe/types.ts";
export { validateRecipe } from "./recipe/validateRecipe.ts";
export { parseRecipe } from "./recipe/parseRecipe.ts";
export { RecipeError } from "./recipe/recipeError.ts";
export { recipeToJson } from "./recipe/recipeToJson.ts";
export { recipeTableProblems } from "./recipe/recipeTableProblems.ts";
export { createFingerprint, type FileFingerprint, type IncrementalFingerprint } from "./recipe/fileFingerprint.ts";
export { isRecipeInput, otherFileLine } from "./recipe/otherFileLine.ts";
export { shoalVersion } from "./recipe/shoalVersion.ts";
