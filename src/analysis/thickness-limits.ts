/** The minimum-thickness search range (thickness.ts), in a module of its own so the app can show it without loading the search. */
export const THICKNESS_MIN_M = 0.01;
export const THICKNESS_TOLERANCE_M = 1e-3;
