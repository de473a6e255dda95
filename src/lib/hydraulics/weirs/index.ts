export type { WeirKind, WeirSpec, WeirHeadResult, WeirOptions, ValidityCheck, SubmergenceState } from './weir-types';
export { weirHead } from './weir-head';
export { weirDischarge } from './weir-discharge';
