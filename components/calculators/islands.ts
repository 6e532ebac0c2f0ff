/**
 * The one mapping from calculator id to its Svelte island (the only part of the registry that
 * cannot live in calc/). The embed wrapper renders from it, and site/lib/islands.ts keeps the
 * islands of the calculators whose definition sets `embed`, for the embed routes and the
 * "Embed this" snippets. Adding a calculator: import its island and add one line.
 */
import type { Component } from 'svelte';
import WavelengthSpacing from './WavelengthSpacing.svelte';
import FrontFedReflector from './FrontFedReflector.svelte';
import ScanLoss from './ScanLoss.svelte';
import RangeExposure from './RangeExposure.svelte';
import ArchitectureSizing from './ArchitectureSizing.svelte';
import EndFireLength from './EndFireLength.svelte';
import BackplaneSpacing from './BackplaneSpacing.svelte';
import ArrayExplorer from './ArrayExplorer.svelte';
import LinkBudget from './LinkBudget.svelte';
import UnitConverter from './UnitConverter.svelte';

/** Props every calculator island accepts. */
export interface IslandProps {
  /** Query string to start from instead of the defaults. */
  preset?: string;
  /** Bind to the page URL (true on a calculator's own page and its embed route). */
  linked?: boolean;
}

export const islandsById: Record<string, Component<IslandProps>> = {
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

