export type { LegMode } from './coloured-structure.ts';
export type { SearchOptions } from './search-tree.ts';
export { canonicalForm, canonicalNotation, type CanonOptions, type CanonicalForm } from './canonical-form.ts';
export { automorphismGroup, type AutomorphismGroup, type AutomorphismOptions } from './automorphism-group.ts';
export { edgePermutationFactor, symmetryFactor } from './symmetry-factor.ts';
export { findIsomorphism, isIsomorphic, type GraphIsomorphism } from './find-isomorphism.ts';
export { MAX_NICKEL_LENGTH, NICKEL_DIGITS, parseNickel } from './nickel-parse.ts';
export { toNickel, type NickelIndex, type NickelOptions } from './nickel-index.ts';
