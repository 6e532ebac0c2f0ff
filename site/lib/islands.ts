/**
 * The one mapping from calculator id to its Svelte island. The embed routes
 * (site/pages/embed/[id].astro) are generated from it, and calculator pages show an "Embed this"
 * snippet for each id listed here. Adding a calculator: import its island and add one line.
 */
import type { Component } from 'svelte';
import WavelengthSpacing from '../../components/calculators/WavelengthSpacing.svelte';
import FrontFedReflector from '../../components/calculators/FrontFedReflector.svelte';
import ScanLoss from '../../components/calculators/ScanLoss.svelte';
import RangeExposure from '../../components/calculators/RangeExposure.svelte';
import ArchitectureSizing from '../../components/calculators/ArchitectureSizing.svelte';
import EndFireLength from '../../components/calculators/EndFireLength.svelte';
import BackplaneSpacing from '../../components/calculators/BackplaneSpacing.svelte';
import ArrayExplorer from '../../components/calculators/ArrayExplorer.svelte';
import LinkBudget from '../../components/calculators/LinkBudget.svelte';
import UnitConverter from '../../components/calculators/UnitConverter.svelte';

/** Props every calculator island accepts. */
export interface IslandProps {
  /** Query string to start from instead of the defaults. */
  preset?: string;
  /** Bind to the page URL (true on a calculator's own page and its embed route). */
  linked?: boolean;
}

export const calculatorIslands: Record<string, Component<IslandProps>> = {
  'wavelength-spacing': WavelengthSpacing,
  'front-fed-reflector': FrontFedReflector,
  'scan-loss': ScanLoss,
  'range-exposure': RangeExposure,
  'architecture-sizing': ArchitectureSizing,
  'end-fire-length': EndFireLength,
  'backplane-spacing': BackplaneSpacing,
  'array-explorer': ArrayExplorer,
  'link-budget': LinkBudget,
  'unit-converter': UnitConverter,
};

