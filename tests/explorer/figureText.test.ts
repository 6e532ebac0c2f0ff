import { describe, expect, it } from 'vitest';
import { cutInSteeringPlane, fixedOrDash } from '../../components/calculators/explorer/figureText';

describe('explorer figure text', () => {
  it('fixedOrDash gives fixed decimals with a true minus sign, and a dash for null, NaN or infinity', () => {
    expect(fixedOrDash(-3.14159)).toBe('−3.14');
    expect(fixedOrDash(0.5, 3)).toBe('0.500');
    expect(fixedOrDash(null)).toBe('—');
    expect(fixedOrDash(Number.NaN)).toBe('—');
    expect(fixedOrDash(Number.POSITIVE_INFINITY)).toBe('—');
  });
  it('cutInSteeringPlane compares azimuths modulo 360°', () => {
    expect(cutInSteeringPlane(0, 0)).toBe(true);
    expect(cutInSteeringPlane(370, 10)).toBe(true);
    expect(cutInSteeringPlane(-90, 270)).toBe(true);
    expect(cutInSteeringPlane(0, 90)).toBe(false);
    expect(cutInSteeringPlane(180, 0)).toBe(false);
  });
});
