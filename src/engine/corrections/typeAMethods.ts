// The registry of type-A methods, in the order reports list them.
import { bathoMethod } from './batho';
import { bathoModifiedMethod } from './bathoModified';
import type { TypeAMethod } from './correctionTypes';
import { eplPddMethod } from './eplPdd';
import { etarMethod } from './etar';
import { rtmrMethod } from './rtmr';
import { waterMethod } from './water';

export const TYPE_A_METHODS: readonly TypeAMethod[] = [
  waterMethod,
  rtmrMethod,
  eplPddMethod,
  bathoMethod,
  bathoModifiedMethod,
  etarMethod,
];

export { TYPE_A_METHOD_IDS } from './typeAMethodIds';

export function typeAMethodById(id: string): TypeAMethod | undefined {
  return TYPE_A_METHODS.find((m) => m.id === id);
}
