export type { WeirKind, WeirSpec, WeirHeadResult, WeirOptions, ValidityCheck, SubmergenceState, CoefficientForm } from './weir-types';
export { weirHead } from './weir-head';
export { weirDischarge } from './weir-discharge';
