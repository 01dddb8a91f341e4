/** Messages between the analysis queue and its worker thread. */
import type { AnalysisOutcome } from './compute-analysis.js';

export interface WorkerRequest {
  id: string;
  row: { mesh: Uint8Array; curves: unknown; basepoints: unknown; vertexLabels: Uint8Array | null };
}

export type WorkerMessage =
  | { id: string; type: 'progress'; fraction: number; stage: string }
  | { id: string; type: 'done'; outcome: AnalysisOutcome };
