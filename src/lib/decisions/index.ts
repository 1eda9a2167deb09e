/** Public API of the decisions core: encapsulant ranking and claim checks. Pure. */
export { coneUnionFraction } from './cone-union';
export { REPORTED_FIGURES, BEST_REPORTED_EXTRACTION, type ReportedFigure } from './best-reported';
export { claimBounds, type PackageForClaim, type ClaimBoundSet } from './claim-bounds';
export {
  checkClaim,
  CLAIM_KINDS,
  CHIP_STRUCTURES,
  TRACE_K,
  type Claim,
  type ClaimKind,
  type ChipStructure,
  type Verdict,
  type ClaimNumber,
  type ClaimResult
} from './claim-check';
export {
  CLAIM_DEFAULTS,
  CLAIM_EXAMPLE,
  CLAIM_VALUE_LIMIT,
  CLAIM_VALUE_FIELD,
  claimValueProblem,
  claimCoreValue,
  claimCoreLimit
} from './claim-input';
export { encapsulantNotes } from './encapsulant-notes';
export {
  rankEncapsulants,
  encapsulantCandidates,
  type IndexSource,
  type Candidate,
  type RankOrder,
  type RankInput,
  type EncapsulantRow,
  type EncapsulantRanking
} from './rank-encapsulants';
export { extractionCurve, type ExtractionCurve } from './extraction-curve';
export { rankingChart } from './ranking-chart';
export { traceAgreement, type TracedCandidate, type PairAgreement } from './trace-agreement';
export {
  traceRanking,
  rankByTrace,
  candidateSeed,
  candidatePackage,
  TRACE_SEPARATION_K,
  type TracedRow
} from './rank-traced';
export { scenarioRanking, emissionSpectrum } from './scenario-ranking';
