import type { Figure, PathwayStyle } from '../model/schema.ts';
import { BAR_WEIGHT } from './figureContext.ts';
import { DASHES, type DashName, type Theme } from './themes.ts';

/** Colour and connector dash of one pathway. */
export interface PathwayPaint {
  colour: string;
  dash: DashName;
  /** Level bar width in connector widths. */
  weight: number;
}

const GREY_ORDER: readonly DashName[] = ['solid', 'dashed', 'dotted', 'dashdot'];

/**
 * Colour from the pathway's own style, else the theme palette by position. In the
 * greyscale theme pathways are told apart without colour: by dash pattern (first pathway
 * keeps the connector's own style), by shade (black and dark grey in turn) and, from the
 * third pathway on, by heavier level bars; an explicit style.dash always wins.
 */
export function pathwayPaint(index: number, style: PathwayStyle | undefined, theme: Theme, connector: Figure['connector']): PathwayPaint {
  const own: DashName = connector === 'dashed' ? 'dashed' : 'solid';
  if (theme.dashByPathway) {
    const order = [own, ...GREY_ORDER.filter((d) => d !== own)];
    const weight = Math.floor(index / 2) % 2 ? HEAVY_BAR : BAR_WEIGHT;
    return { colour: theme.palette[index % theme.palette.length]!, dash: style?.dash ?? order[index % order.length]!, weight };
  }
  return { colour: style?.colour ?? theme.palette[index % theme.palette.length]!, dash: style?.dash ?? own, weight: BAR_WEIGHT };
}

/** Heavier level bars for every other pair of pathways in greyscale (our choice). */
const HEAVY_BAR = 2.8;

/** Dash lengths in mm for a named pattern at a line width. */
export function dashMm(dash: DashName, widthMm: number): number[] | undefined {
  return DASHES[dash]?.map((d) => d * widthMm);
}
