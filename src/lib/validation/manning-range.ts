// The Manning's n a case may give, in the case schema and the survey CSV alike. No channel surface is smoother than
// about n = 0.009 (glass, smooth brass: Chow, Open-Channel Hydraulics, 1959, table 5-6, recalled from memory), so
// 0.005 refuses only typing errors; a value near zero also drives the normal depth towards zero, where the engine
// could only name its own variables. The upper bound is past the densest vegetated floodplains of the same table.
export const MIN_MANNING_N = 0.005;
export const MAX_MANNING_N = 0.5;
