/**
 * The scene: what a figure is made of, in millimetres with y growing downwards.
 * The layout produces it once; the canvas, SVG, PDF and PNG all draw this same value.
 */

/** One step of a path: move, line, cubic Bézier, close. */
export type Segment =
  | { op: 'M'; x: number; y: number }
  | { op: 'L'; x: number; y: number }
  | { op: 'C'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { op: 'Z' };

/** How a path is stroked; `dashMm` alternates on/off lengths, absent for solid. */
export interface Stroke {
  colour: string;
  widthMm: number;
  dashMm?: number[];
  cap?: 'butt' | 'round';
}

/** What a primitive stands for, so the canvas can pick and style it. */
export type Role =
  | 'background' | 'level' | 'connector' | 'axis' | 'tick' | 'arrow'
  | 'legend' | 'leader' | 'label' | 'annotation' | 'title' | 'structure' | 'errorBar';

/** A stroked and/or filled path. */
export interface PathItem {
  kind: 'path';
  role: Role;
  segments: Segment[];
  stroke?: Stroke;
  fill?: string;
  pathway?: string;
  point?: string;
  /** For a mark inside a label block (a stacked label's pathway key): as on TextItem. */
  levels?: { pathway: string; point: string }[];
  block?: string;
  /** Name of the group the item belongs to (a molecule drawing); consecutive items share it. */
  group?: string;
}

/** A run of text at one size, offset from its item's anchor (baseline, left end). */
export interface TextRun {
  text: string;
  dx: number;
  dy: number;
  sizeMm: number;
}

/** Axis-aligned box in mm. */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A text item: runs placed relative to an anchor, optionally rotated about it. */
export interface TextItem {
  kind: 'text';
  role: Role;
  x: number;
  y: number;
  runs: TextRun[];
  colour: string;
  /** Rotation in degrees, clockwise on the page (SVG sense), about (x, y). */
  rotateDeg?: number;
  /** Unrotated bounding box on the page (for rotated text, the rotated extent). */
  box: Box;
  pathway?: string;
  point?: string;
  /**
   * For a label line: the levels its block stands for when more than the item's own
   * (a state shared by pathways, a stack of close levels), as pathway and point ids.
   */
  levels?: { pathway: string; point: string }[];
  /** For a label line: the id its block's lines share, when not its pathway/point. */
  block?: string;
  /** As on PathItem. */
  group?: string;
}

/**
 * Everything a figure is drawn from. New primitives (e.g. structure drawings) join this
 * union; give them a `box` (their extent on the page) so the geometry audit and the label
 * placement count them as obstacles without knowing their kind.
 */
export type SceneItem = PathItem | TextItem;

/**
 * A label the layout left out of the drawing because no spot clear of the bars and the
 * other labels was left for it inside the plot (no text and no leader line is drawn).
 * - `level`: the label of a level; `pathway` and `point` are ids (as on the level's
 *   items), `pathwayName` and `label` what the user calls them (the label as typed). A
 *   state shared by several pathways, labelled once, is listed once, under the first.
 * - `annotation`: the label of a barrier arrow or span bracket; `annotation` indexes
 *   `doc.figure.annotations` (from 0), `text` is the label's text (e.g. "ΔG‡ = 14.2").
 * - `structure`: the molecule drawing of a level, named like a level's label.
 */
export type OmittedLabel =
  | { kind: 'level'; pathway: string; point: string; pathwayName: string; label: string }
  | { kind: 'structure'; pathway: string; point: string; pathwayName: string; label: string }
  | { kind: 'annotation'; annotation: number; pathway: string; pathwayName: string; text: string };

/** A complete figure. */
export interface Scene {
  widthMm: number;
  heightMm: number;
  /** Page colour, or null for transparent. */
  background: string | null;
  fontFamily: string;
  items: SceneItem[];
  /**
   * Labels left out for want of room, in placement order (empty, never absent, when all
   * fit). Labels the user placed by hand are always drawn and never listed here.
   */
  omittedLabels: OmittedLabel[];
}

/** Millimetres per typographic point (1 pt = 1/72 in, 1 in = 25.4 mm exactly). */
export const MM_PER_PT = 25.4 / 72;
