import { describe, expect, it } from 'vitest';
import { levelColour, prepareUvMap, uvMapPixels, uvToAngles, UV_COLOUR_STOPS } from '../../components/plot/uvMapModel';

const luminance = ([r, g, b]: number[]) => 0.2126 * r + 0.7152 * g + 0.0722 * b;

describe('levelColour(db, floorDb)', () => {
  it('gives the first stop at the floor and below, the last at 0 dB and above', () => {
    const hex = (rgb: number[]) => `#${rgb.map((c) => c.toString(16).padStart(2, '0')).join('')}`;
    expect(hex(levelColour(-60, -60))).toBe(UV_COLOUR_STOPS[0]);
    expect(hex(levelColour(-300, -60))).toBe(UV_COLOUR_STOPS[0]);
    expect(hex(levelColour(0, -60))).toBe(UV_COLOUR_STOPS[UV_COLOUR_STOPS.length - 1]);
    expect(hex(levelColour(3, -60))).toBe(UV_COLOUR_STOPS[UV_COLOUR_STOPS.length - 1]);
    expect(hex(levelColour(Number.NaN, -60))).toBe(UV_COLOUR_STOPS[0]);
  });
  it('gets lighter as the level rises, so brightness alone orders the levels (print, colour-blind readers)', () => {
    let previous = -1;
    for (let db = -60; db <= 0; db += 1) {
      const l = luminance(levelColour(db, -60));
      expect(l).toBeGreaterThan(previous);
      previous = l;
    }
  });
});

describe('uvMapPixels(count, powerDb, visible, floorDb)', () => {
  it('puts v = +1 in the top row and leaves invisible samples transparent', () => {
    const count = 2;
    // index j·count + i: (u0,v0)=−60 dB, (u1,v0)=0 dB, (u0,v1)=invisible, (u1,v1)=−30 dB
    const pixels = uvMapPixels(count, [-60, 0, 0, -30], [1, 1, 0, 1], -60);
    const at = (row: number, col: number) => Array.from(pixels.slice(4 * (row * count + col), 4 * (row * count + col) + 4));
    expect(at(0, 0)[3]).toBe(0); // top-left is (u0, v1): invisible
    expect(at(0, 1)).toEqual([...levelColour(-30, -60), 255]);
    expect(at(1, 0)).toEqual([...levelColour(-60, -60), 255]);
    expect(at(1, 1)).toEqual([...levelColour(0, -60), 255]);
  });
});

describe('prepareUvMap(floorDb)', () => {
  it('maps u to the right and v upwards over a square, and inverts exactly', () => {
    const m = prepareUvMap(-60);
    expect(m.x(1) - m.x(-1)).toBeCloseTo(m.inner.size, 12);
    expect(m.y(1)).toBeLessThan(m.y(-1));
    const back = m.invert(m.x(0.3), m.y(-0.7));
    expect(back.u).toBeCloseTo(0.3, 12);
    expect(back.v).toBeCloseTo(-0.7, 12);
  });
  it('labels the legend every 10 dB from 0 dB at the top to the floor at the bottom', () => {
    const m = prepareUvMap(-60);
    expect(m.legend.ticks.map((t) => t.db)).toEqual([0, -10, -20, -30, -40, -50, -60]);
    expect(m.legend.ticks[0].y).toBe(m.legend.top);
    expect(m.legend.ticks[6].y).toBe(m.legend.top + m.legend.height);
    expect(m.legend.stops[0]).toEqual({ offset: 0, colour: UV_COLOUR_STOPS[UV_COLOUR_STOPS.length - 1] });
    expect(m.legend.stops.at(-1)).toEqual({ offset: 1, colour: UV_COLOUR_STOPS[0] });
  });
});

describe('uvToAngles(u, v)', () => {
  it('returns θ, φ in degrees inside visible space and null outside (calc/angleConvention)', () => {
    const a = uvToAngles(Math.sin(Math.PI / 6) * Math.cos(Math.PI / 4), Math.sin(Math.PI / 6) * Math.sin(Math.PI / 4))!;
    expect(a.thetaDeg).toBeCloseTo(30, 10);
    expect(a.phiDeg).toBeCloseTo(45, 10);
    expect(uvToAngles(0, -0.5)!.phiDeg).toBeCloseTo(270, 10);
    expect(uvToAngles(0.9, 0.9)).toBeNull();
  });
});
