/** Heegaard diagrams on a triangle mesh: every curve is a cycle of mesh edges, every basepoint a mesh vertex. */
import type { TriMesh } from '../mesh/tri-mesh.js';

export type CurveFamily = 'alpha' | 'beta';

/** One attaching curve as a closed cycle of vertices along mesh edges (first vertex not repeated at the end). */
export interface DiagramCurve {
  family: CurveFamily;
  /** 0-based index within its family; users see index + 1 (alpha_1, beta_1, ...). */
  index: number;
  /** Consecutive vertices are joined by a mesh edge; the last joins the first. The order gives the orientation. */
  vertices: Int32Array;
}

/** 'z' basepoints are the ones HF-hat avoids; 'w' is a second set (knot diagrams: O markings). */
export type BasepointKind = 'z' | 'w';

export interface Basepoint {
  kind: BasepointKind;
  /** 0-based index within its kind; users see z_1, z_2, ... */
  index: number;
  /** A mesh vertex on no curve. */
  vertex: number;
}

export interface HeegaardDiagram {
  mesh: TriMesh;
  curves: DiagramCurve[];
  basepoints: Basepoint[];
  /**
   * Vertex numbers as the user's file gives them (1-based), one per mesh vertex; absent means v + 1.
   * Messages and reports always show these numbers.
   */
  vertexLabels?: Int32Array;
}

/** The number a user sees for mesh vertex v. */
export const vertexLabel = (d: Pick<HeegaardDiagram, 'vertexLabels'>, v: number): number =>
  d.vertexLabels ? d.vertexLabels[v] : v + 1;

/** The name a user sees for a curve: alpha_1, beta_2, ... */
export const curveName = (c: Pick<DiagramCurve, 'family' | 'index'>): string => `${c.family}_${c.index + 1}`;
