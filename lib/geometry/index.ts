/**
 * lib/geometry: pure 2D math on plain numbers for the check engine — rectangles and intervals,
 * union areas, the largest rectangle inside a union, spatial pairing and clustering, and the
 * free-floor sweep for a person-sized disk, the revision cloud. Must never import anything of ours, nor UI,
 * framework or database code (lint-enforced).
 */
export * from './rect';
export * from './disjointSet';
export * from './union';
export * from './largestRectangle';
export * from './spatialIndex';
export * from './freeFloor';
export * from './widestPath';
export * from './revisionCloud';
export * from './workBudget';
