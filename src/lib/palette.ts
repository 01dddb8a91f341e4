/**
 * Quadrant's palette as plain values, for code that cannot read CSS (the 3D viewer, SVG exports).
 * Mirrors the `@theme` tokens in src/styles.css; keep the two in step.
 *
 * Curve and basepoint colours come from the Okabe–Ito colour-blind-safe set (Okabe & Ito 2008,
 * "Color Universal Design"), so alpha and beta stay distinguishable under protanopia, deuteranopia and
 * tritanopia, and against the paper background.
 */
export const palette = {
  paper: '#f7f6f2',
  surface: '#ffffff',
  sunken: '#efede6',
  line: '#d8d4c8',
  ink: '#1c2736',
  inkMuted: '#4b5565',
  inkFaint: '#636a77',
  lineStrong: '#8a8577',
  accent: '#0f6e74',
  accentSoft: '#e2f0ef',
  focus: '#c2410c',
  danger: '#b42318',
  /** alpha curves (Okabe–Ito blue) */
  curveAlpha: '#0072b2',
  /** beta curves (Okabe–Ito vermilion) */
  curveBeta: '#d55e00',
  /** basepoint z (Okabe–Ito bluish green) */
  pointZ: '#009e73',
  /** basepoint w (Okabe–Ito reddish purple) */
  pointW: '#cc79a7',
  /** neutral surface shading for the mesh in 3D */
  meshBase: '#e9e6dc',
  meshEdge: '#b8b3a4',
} as const;

/** Colour for a curve family: alpha → blue, beta → vermilion. */
export const CURVE_COLORS = { alpha: palette.curveAlpha, beta: palette.curveBeta } as const;

/** Colour for a basepoint kind. */
export const BASEPOINT_COLORS = { z: palette.pointZ, w: palette.pointW } as const;

export type PaletteToken = keyof typeof palette;
