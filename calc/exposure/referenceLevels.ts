/**
 * A small table of published power-density reference levels for whole-body exposure, for
 * orientation only: compliance follows the local regulation in force and a qualified assessment.
 * Each entry names its guideline and edition. Values are plane-wave equivalent power densities in
 * W/m² as functions of frequency, over the range each guideline gives them.
 */
import { requirePositive } from '../errors';

export interface ReferenceLevelSet {
  id: string;
  /** Guideline, edition and table. */
  guideline: string;
  population: 'general public' | 'occupational';
  /** Frequency range covered, Hz. */
  minHz: number;
  maxHz: number;
  /** Power density limit, W/m², at frequencyHz (within minHz…maxHz). */
  limitWPerM2: (frequencyHz: number) => number;
  /** Averaging time, minutes. */
  averagingMinutes: number;
  /** How the values were taken into this table. */
  provenance: string;
}

const MHz = 1e6;

/**
 * ICNIRP 2020 (Health Phys. 118(5):483–524), Table 5 (table number from memory), whole-body average incident power density.
 * FCC 47 CFR §1.1310(e), Table 1 (table number from memory; MPE limits; 1 mW/cm² = 10 W/m²).
 */
export const REFERENCE_LEVEL_SETS: ReferenceLevelSet[] = [
  {
    id: 'icnirp2020-public',
    guideline: 'ICNIRP Guidelines 2020 (Health Phys. 118(5)), Table 5 (table number from memory), whole-body average',
    population: 'general public',
    minHz: 30 * MHz,
    maxHz: 300e9,
    limitWPerM2: (f) => (f < 400 * MHz ? 2 : f < 2000 * MHz ? f / MHz / 200 : 10),
    averagingMinutes: 30,
    provenance: 'from memory: 2 W/m² (30–400 MHz), f/200 (400–2000 MHz, f in MHz), 10 W/m² (2–300 GHz)',
  },
  {
    id: 'icnirp2020-occupational',
    guideline: 'ICNIRP Guidelines 2020 (Health Phys. 118(5)), Table 5 (table number from memory), whole-body average',
    population: 'occupational',
    minHz: 30 * MHz,
    maxHz: 300e9,
    limitWPerM2: (f) => (f < 400 * MHz ? 10 : f < 2000 * MHz ? f / MHz / 40 : 50),
    averagingMinutes: 30,
    provenance: 'from memory: 10 W/m² (30–400 MHz), f/40 (400–2000 MHz, f in MHz), 50 W/m² (2–300 GHz)',
  },
  {
    id: 'fcc-general',
    guideline: 'US FCC 47 CFR §1.1310, Table 1 (table number from memory), general population/uncontrolled exposure',
    population: 'general public',
    minHz: 30 * MHz,
    maxHz: 100e9,
    limitWPerM2: (f) => (f < 300 * MHz ? 2 : f < 1500 * MHz ? (f / MHz / 1500) * 10 : 10),
    averagingMinutes: 30,
    provenance: 'from memory: 0.2 mW/cm² (30–300 MHz), f/1500 mW/cm² (300–1500 MHz), 1 mW/cm² (1.5–100 GHz)',
  },
  {
    id: 'fcc-occupational',
    guideline: 'US FCC 47 CFR §1.1310, Table 1 (table number from memory), occupational/controlled exposure',
    population: 'occupational',
    minHz: 30 * MHz,
    maxHz: 100e9,
    limitWPerM2: (f) => (f < 300 * MHz ? 10 : f < 1500 * MHz ? (f / MHz / 300) * 10 : 50),
    averagingMinutes: 6,
    provenance: 'from memory: 1 mW/cm² (30–300 MHz), f/300 mW/cm² (300–1500 MHz), 5 mW/cm² (1.5–100 GHz)',
  },
];

/** The reference level of a set at a frequency, W/m², or null outside the set's range. */
export function referenceLevelWPerM2(setId: string, frequencyHz: number): number | null {
  requirePositive('frequencyHz', frequencyHz, 'Hz');
  const set = REFERENCE_LEVEL_SETS.find((s) => s.id === setId);
  if (!set || frequencyHz < set.minHz || frequencyHz > set.maxHz) return null;
  return set.limitWPerM2(frequencyHz);
}
