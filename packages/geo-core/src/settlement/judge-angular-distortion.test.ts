import { describe, expect, it } from 'vitest';
import { judgeAngularDistortion } from './judge-angular-distortion.js';

describe('judgeAngularDistortion(angularDistortion)', () => {
  it('1/400 exceeds Bjerrum’s 1/500 safe limit and Skempton & MacDonald’s 1/500 design limit, next 1/300', () => {
    const [bjerrum, skempton] = judgeAngularDistortion(1 / 400);
    expect(bjerrum?.exceededLimit?.ratioLabel).toBe('1/500');
    expect(bjerrum?.nextLimit?.ratioLabel).toBe('1/300');
    expect(bjerrum?.statement).toMatch(/^Bjerrum \(1963\): 1\/400 exceeds 1\/500 \(safe limit for buildings where cracking is not permissible\)/);
    expect(skempton?.exceededLimit?.ratioLabel).toBe('1/500');
  });

  it('a value exactly at a limit reaches it without exceeding it', () => {
    expect(judgeAngularDistortion(1 / 500)[0]?.exceededLimit?.ratioLabel).toBe('1/600');
  });

  it('is within every limit below 1/750 and beyond every limit above 1/150', () => {
    expect(judgeAngularDistortion(1 / 1000)[0]?.exceededLimit).toBeNull();
    expect(judgeAngularDistortion(1 / 100)[1]?.nextLimit).toBeNull();
    expect(judgeAngularDistortion(0)[0]?.statement).toMatch(/within every limit/);
  });

  it('throws RangeError for a negative distortion', () => {
    expect(() => judgeAngularDistortion(-0.001)).toThrow(new RangeError('judgeAngularDistortion requires a finite angularDistortion >= 0'));
  });
});
