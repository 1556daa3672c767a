export { groupFactor, hasGroupFactors, KNOWN_TENSORS, type GroupFactor } from './group-factor.ts';
export { onTensor, type LegPairingTerm, type OnTensor } from './on-group-factor.ts';
