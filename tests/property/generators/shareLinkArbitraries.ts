// fast-check generators for share-link hashes: what a user may paste or a chat client may mangle.
// Each generator yields a description the test turns into a hash (encoding is asynchronous):
// a document to encode (valid or malformed case or plan), an encoded link damaged afterwards
// (cut short, a character changed), or plain text.
import fc from 'fast-check';
import { malformedCase, validCase } from './caseArbitraries';
import { malformedPlan, validPlan } from './planArbitraries';

export type LinkRecipe =
  /** Encode `doc` under `#kind=`: a validated document or problems by field path must come back. */
  | { kind: 'encode'; linkKind: 'case' | 'plan'; doc: unknown; valid: boolean }
  /** Encode `doc`, then cut the payload at `cutAt` (fraction) or change one character. */
  | {
      kind: 'damage';
      linkKind: 'case' | 'plan';
      doc: unknown;
      cutAt: number;
      change: { at: number; to: string } | null;
    }
  /** Raw text used as the hash. */
  | { kind: 'text'; hash: string };

const BASE64URL = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';

const base64UrlText = fc
  .array(fc.constantFrom(...BASE64URL.split('')), { maxLength: 120 })
  .map((cs) => cs.join(''));

export const linkRecipe: fc.Arbitrary<LinkRecipe> = fc.oneof(
  validCase.map((doc) => ({
    kind: 'encode' as const,
    linkKind: 'case' as const,
    doc,
    valid: true,
  })),
  malformedCase.map((doc) => ({
    kind: 'encode' as const,
    linkKind: 'case' as const,
    doc,
    valid: false,
  })),
  validPlan.map((doc) => ({
    kind: 'encode' as const,
    linkKind: 'plan' as const,
    doc,
    valid: true,
  })),
  malformedPlan.map((doc) => ({
    kind: 'encode' as const,
    linkKind: 'plan' as const,
    doc,
    valid: false,
  })),
  fc
    .record({
      linkKind: fc.constantFrom<'case' | 'plan'>('case', 'plan'),
      doc: validCase,
      cutAt: fc.double({ min: 0, max: 1, noNaN: true }),
      change: fc.option(
        fc.record({
          at: fc.double({ min: 0, max: 1, noNaN: true }),
          to: fc.oneof(fc.constantFrom(...BASE64URL.split('')), fc.string({ maxLength: 2 })),
        }),
      ),
    })
    .map((r) => ({ kind: 'damage' as const, ...r })),
  fc
    .oneof(
      fc.string({ maxLength: 80 }),
      fc.string({ unit: 'binary', maxLength: 40 }),
      base64UrlText.map((t) => `#case=${t}`),
      base64UrlText.map((t) => `#plan=${t}`),
      fc.string({ maxLength: 40 }).map((t) => `#case=${t}`),
      fc.constantFrom('', '#', '#case=', '#plan=', '#case', 'case=', '#case==', '#other=abc'),
    )
    .map((hash) => ({ kind: 'text' as const, hash })),
);
