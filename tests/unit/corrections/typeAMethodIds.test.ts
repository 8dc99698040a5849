import { describe, expect, it } from 'vitest';
import { TYPE_A_METHODS } from '../../../src/engine/corrections/typeAMethods';
import { TYPE_A_METHOD_IDS } from '../../../src/engine/corrections/typeAMethodIds';

describe('TYPE_A_METHOD_IDS', () => {
  it('lists the registry’s methods, in the registry’s order', () => {
    expect(TYPE_A_METHOD_IDS).toEqual(TYPE_A_METHODS.map((m) => m.id));
  });
});
