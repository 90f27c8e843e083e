/** Exact factors between the US customary units the US standards write in and core units. */
export const MM_PER_IN = 25.4;
export const N_PER_LBF = 4.4482216152605;
export const MPA_PER_PSI = N_PER_LBF / (MM_PER_IN * MM_PER_IN);
export const MPA_PER_KSI = 1000 * MPA_PER_PSI;
export const N_PER_KIP = 1000 * N_PER_LBF;
