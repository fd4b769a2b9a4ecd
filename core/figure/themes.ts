import type { Figure, PathwayStyle } from '../model/schema.ts';

export type ThemeName = Figure['theme'];
export type DashName = NonNullable<PathwayStyle['dash']>;

/** Colours of one theme. */
export interface Theme {
  background: string | null;
  /** Text, axis and shared-label colour. */
  ink: string;
  /** Leader lines and other quiet marks. */
  muted: string;
  palette: readonly string[];
  /** Greyscale: pathways differ by dash pattern instead of colour. */
  dashByPathway: boolean;
}

/**
 * Okabe & Ito's colour-blind-safe set (M. Okabe, K. Ito, "Color Universal Design (CUD):
 * how to make figures and presentations that are friendly to colorblind people", 2008;
 * reprinted by B. Wong, Nature Methods 8, 441 (2011)) — hex values from memory, in an
 * order of our own: strongest contrasts first, yellow last on white.
 */
export const OKABE_ITO = {
  black: '#000000', orange: '#E69F00', skyBlue: '#56B4E9', bluishGreen: '#009E73',
  yellow: '#F0E442', blue: '#0072B2', vermillion: '#D55E00', reddishPurple: '#CC79A7',
} as const;

const o = OKABE_ITO;

/** The three themes. */
export const THEMES: Readonly<Record<ThemeName, Theme>> = {
  colour: {
    background: '#FFFFFF', ink: '#1A1A1A', muted: '#8C8C8C', dashByPathway: false,
    palette: [o.blue, o.vermillion, o.bluishGreen, o.reddishPurple, o.orange, o.skyBlue, o.black, o.yellow],
  },
  greyscale: {
    background: '#FFFFFF', ink: '#000000', muted: '#8C8C8C', dashByPathway: true,
    palette: ['#000000', '#5C5C5C'],
  },
  // Dark slides: the lighter Okabe–Ito colours read on a near-black page; blue and black do not.
  dark: {
    background: '#16181D', ink: '#EDEDED', muted: '#7A7F88', dashByPathway: false,
    palette: [o.skyBlue, o.orange, o.bluishGreen, o.yellow, o.reddishPurple, o.vermillion, '#EDEDED'],
  },
};

/** Dash patterns in multiples of the line width (our choice). */
export const DASHES: Readonly<Record<DashName, number[] | undefined>> = {
  solid: undefined,
  dashed: [4, 3],
  dotted: [1, 2],
  dashdot: [6, 2.5, 1, 2.5],
};
