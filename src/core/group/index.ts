export { groupFactor, hasGroupFactors, type GroupFactor } from './group-factor.ts';
export { onTensor, type LegPairingTerm, type OnTensor } from './on-group-factor.ts';
