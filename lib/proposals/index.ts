/**
 * Proposals: from a client's brief to checked starting layouts (generate.ts), with the brief's
 * schema (brief.ts), the arrangement patterns (patterns.ts), scores (score.ts) and reasons
 * (reasons.ts). Pure: must never import React, Next, the database or the services.
 */
export * from './brief';
export { generateProposals, briefBay, variantsFor, MAX_CANDIDATES, MAX_PROPOSALS, type Proposal, type NearMiss, type ProposalResult, type ProposalStats } from './generate';
export { briefFromLayout } from './brief-from-layout';
export { PATTERNS, patternsFor, freshLitres, type PatternId } from './patterns';
export { METRIC_WORDS, type Figures, type Score, type Metric } from './score';
export type { Reason } from './reasons';
