/**
 * The plain data passed between the pipeline's stages (DESIGN section 2).
 *
 * collect -> SourceFile[] -> parse -> PageFacts[] -> graph -> SiteGraph
 *   -> rank -> Ranking -> text -> TermIndex/Related -> suggest -> Suggestion[]
 *   -> rules -> Finding[] -> report -> Report
 *
 * Everything here is readonly data. Typed arrays are used where a stage's hot loop needs them;
 * the report stage maps them back to JSON-friendly arrays.
 */
export {};
