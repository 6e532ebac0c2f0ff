/**
 * The islands of the calculators that can be embedded (their definition sets `embed: true`): the
 * embed routes (site/pages/embed/[id].astro) are generated from this, and calculator pages show an
 * "Embed this" snippet for each id listed here. The id → island map itself is
 * components/calculators/islands.ts.
 */
import type { Component } from 'svelte';
import { calculatorFactories } from '../../calc/calculators/index';
import { teamConventions } from '../../calc/teamConventions';
import { islandsById, type IslandProps } from '../../components/calculators/islands';

export type { IslandProps };

export const calculatorIslands: Record<string, Component<IslandProps>> = Object.fromEntries(
  Object.entries(islandsById).filter(([id]) => calculatorFactories[id]?.(teamConventions).embed === true),
);
