// Ids of the type-A methods, in the order reports list them (the registry, typeAMethods.ts, holds
// the methods in this order; a test checks both agree). Kept apart so the page can name the
// methods without loading them.
export const TYPE_A_METHOD_IDS: readonly string[] = [
  'water',
  'rtmr',
  'epl-pdd',
  'batho',
  'batho-modified',
  'etar',
];
