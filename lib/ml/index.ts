// Public API of the filing engine. lib/ml is pure TypeScript: no database, no network, no
// Next.js; callers pass documents and string labels, and store the model bytes where they like.
export type { MlDocument, DocumentMeta, LabelledDocument } from "./types";
export type { Prediction, ClassScore, WhyTerm } from "./predict";
export type { FoldwrightModel, TrainOptions, TrainOptionsInput, TrainTimings } from "./model";
export type { EvaluationReport, EvaluationOptions, EvaluationTimings } from "./evaluate";
export type { AutoFileBar } from "./auto-file";
export type { ClassificationMetrics, ClassMetrics } from "./metrics";
export { trainModel, trainOnCounts, predictDocument, predictDocuments, predictCounts, vectoriseDocuments, resolveOptions, MODEL_KIND, MODEL_FORMAT_VERSION } from "./model";
export { evaluateSplit, crossValidate, evaluateCountSplit, crossValidateCounts } from "./evaluate";
export { saveModel, loadModel } from "./artifact";
export { findAutoFileBar } from "./auto-file";
export { tokenizeDocument, TOKENIZER_VERSION, DEFAULT_TOKENIZE_OPTIONS } from "./tokenize";
export type { CountMatrix, TermCounts } from "./term-counts";
export { countTerms, encodeTermCounts, decodeTermCounts, CountMatrixBuilder, countMatrixOf, allRows } from "./term-counts";
