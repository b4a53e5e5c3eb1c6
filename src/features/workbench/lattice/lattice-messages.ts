import type { LatticeKind } from '@shared/workbench/lattice.ts';
import type { latticeResult } from '@shared/workbench/calculators/lattice-calculator.ts';
import type { CorrectedImage } from '@shared/workbench/lattice-corrected.ts';

export type LatticeResult = ReturnType<typeof latticeResult>;

/** What the page sends its worker. */
export interface LatticeRequest {
  id: number;
  rows: Float64Array[];
  lattice: { kind: LatticeKind; constantNm: number };
  scanSpanV?: { x: number; y: number };
}

/** What the worker answers: the result and the spectrum to draw, or the refusal. */
export type LatticeReply =
  | {
      id: number;
      ok: true;
      result: LatticeResult;
      candidates: { kx: number; ky: number }[];
      spectrum: Float32Array;
      paddedSize: number;
      /** The image on a square nm grid, and the ideal lattice's sites on it (none for a line grating). */
      corrected: CorrectedImage | null;
      sites: { x: number; y: number }[];
      ms: number;
    }
  | { id: number; ok: false; message: string; code: string };
