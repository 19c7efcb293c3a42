// The planner's defaults. Marked "common practice" where they are what bakers' guides generally
// give (from memory, no single source); the rest are our own choices, said so.

export const DEFAULTS = {
  /** Levain 1 : 2 : 2 — peaks in about 6–8 h near 24 °C [common practice]. */
  feedRatio: { starter: 1, flour: 2, water: 2 },
  feedMinutes: 5,
  mixMinutes: 10,
  /** A 30-minute rest (autolyse with the levain in) before the salt [common practice: 20–60 min]. */
  restMinutes: 30,
  saltMinutes: 5,
  /** 4 sets, 30 min apart, in the first part of bulk [common practice]. */
  foldSets: 4,
  foldIntervalMinutes: 30,
  foldMinutes: 5,
  /** Divide, pre-shape, 20-minute bench rest, final shape [common practice]. */
  shapeMinutes: 30,
  /** A heavy pot needs 45–60 min to heat through [common practice]. */
  preheatMinutes: 45,
  /** Lean hearth loaf: about 250 °C, 20 min lidded then 20–30 min uncovered [common practice]. */
  ovenC: 250,
  bakeMinMinutes: 40,
  bakeMaxMinutes: 50,
  /** The crumb sets as it cools: at least an hour before slicing [common practice]. */
  coolMinutes: 60,
  /** A cooled loaf waiting up to 2 h for "ready at" is still fresh [our choice]. */
  maxHoldMinutes: 120,
  takeOutMinutes: 5,
  finishMinutes: 5,
  /** Cold retard of shaped dough: about 4 °C for 8–16 h [common practice]. */
  fridgeC: 4,
  retardMinHours: 8,
  retardMaxHours: 16,
  /** Range the temperature lever may suggest for the bulk: 18–30 °C [common practice for dough]. */
  leverMinC: 18,
  leverMaxC: 30,
  /** How far ahead a plan may reach, h (the search is on a 5-minute grid). */
  maxLookaheadHours: 7 * 24,
} as const;

/**
 * A room-temperature final proof takes this share of the bulk's fermentation work (hours at
 * 24 °C): at one temperature 40 % of the bulk's length, e.g. about 2 h after a 5-hour bulk — in
 * line with the 1–3 h bakers give for a proof after a 4–6 h bulk [common practice; the 40 % is our
 * assumption, not a published constant].
 */
export const PROOF_SHARE_OF_BULK = 0.4;

/** Candidate times are tried on this grid, minutes. */
export const GRID_MINUTES = 5;
