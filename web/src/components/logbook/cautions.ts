// Cautions from the product brief, shown where a screen touches food safety.
export const DISCOLOURATION_CAUTION =
  'A culture with pink, orange or fuzzy growth is discarded, not rescued. When in doubt, throw it out and start again or ask for a piece of someone else’s.';
