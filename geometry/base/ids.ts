/** Branded integer ids. They cost nothing at run time and stop mixing a face for a vertex. */
export type VertexId = number & { readonly __brand: 'VertexId' };
export type FaceId = number & { readonly __brand: 'FaceId' };
/** Half-edge h = 3f + k: corner k of face f, running from heVert[h] to heVert[next(h)]. */
export type HalfEdgeId = number & { readonly __brand: 'HalfEdgeId' };
export type RegionId = number & { readonly __brand: 'RegionId' };
