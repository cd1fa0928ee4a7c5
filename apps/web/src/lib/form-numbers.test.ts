import { describe, expect, it } from 'vitest';
import { numberOrNull, numberOrUndefined } from './form-numbers';

describe('numberOrNull(value)', () => {
  it('reads a decimal written with a point or a comma', () => {
    expect([numberOrNull('2.70'), numberOrNull('2,70')]).toEqual([2.7, 2.7]);
  });

  it('turns an empty field into null so optional numbers can be left blank', () => {
    expect([numberOrNull(''), numberOrNull('  '), numberOrNull(undefined)]).toEqual([null, null, null]);
  });

  it('keeps text that is not a number, so the schema says what is wrong', () => {
    expect(numberOrNull('twenty')).toBe('twenty');
  });
});

describe('numberOrUndefined(value)', () => {
  it('leaves an empty field out', () => {
    expect(numberOrUndefined('')).toBeUndefined();
  });
});
