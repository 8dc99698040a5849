// Fixed texts a calculation report carries, in a module of their own so the page can show and
// compare them without loading the engine (which runs in the workers).

/** The cautions carried with every result. */
export const CAUTIONS: readonly string[] = [
  'Lamina is a teaching and independent-check aid, not a treatment-planning or MU-verification system.',
  'A modelled beam is not a commissioned beam: results depend on the beam data entered or modelled.',
  'Clinical decisions follow the local protocol and a licensed medical physicist’s judgement.',
  'Slab phantoms are idealised: laterally infinite flat layers, central axis only, no patient contour or motion.',
];

/** Reason given for a type-A method that has no water data to work from. */
export const NEEDS_WATER_DATA = 'needs water data: load a measured TMR/PDD table';
