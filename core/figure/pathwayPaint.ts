import type { Figure, PathwayStyle } from '../model/schema.ts';
import { DASHES, type DashName, type Theme } from './themes.ts';

/** Colour and connector dash of one pathway. */
export interface PathwayPaint {
  colour: string;
  dash: DashName;
}

const GREY_ORDER: readonly DashName[] = ['solid', 'dashed', 'dotted', 'dashdot'];

/**
 * Colour from the pathway's own style, else the theme palette by position. In the
 * greyscale theme the colour is the theme's and pathways are told apart by dash pattern
 * (first pathway keeps the connector's own style); an explicit style.dash always wins.
 */
export function pathwayPaint(index: number, style: PathwayStyle | undefined, theme: Theme, connector: Figure['connector']): PathwayPaint {
  const own: DashName = connector === 'dashed' ? 'dashed' : 'solid';
  if (theme.dashByPathway) {
    const order = [own, ...GREY_ORDER.filter((d) => d !== own)];
    return { colour: theme.palette[Math.floor(index / order.length) % theme.palette.length]!, dash: style?.dash ?? order[index % order.length]! };
  }
  return { colour: style?.colour ?? theme.palette[index % theme.palette.length]!, dash: style?.dash ?? own };
}

/** Dash lengths in mm for a named pattern at a line width. */
export function dashMm(dash: DashName, widthMm: number): number[] | undefined {
  return DASHES[dash]?.map((d) => d * widthMm);
}
