// Runs the lattice analysis off the page's thread: the same shared functions the API runs, plus the
// log-magnitude spectrum for the picture.
import { analyseLattice, LatticeError } from '@shared/workbench/lattice.ts';
import { latticeResult } from '@shared/workbench/calculators/lattice-calculator.ts';
import { correctedImage, latticeSites } from '@shared/workbench/lattice-corrected.ts';
import type { LatticeRequest, LatticeReply } from './lattice-messages.ts';

self.onmessage = (e: MessageEvent<LatticeRequest>) => {
  const { id, rows, lattice, scanSpanV } = e.data;
  const t0 = performance.now();
  let reply: LatticeReply;
  try {
    const analysis = analyseLattice(rows, lattice, { withSpectrum: true });
    const result = latticeResult({ lattice, scanSpanV }, analysis);
    // The image on a square nm grid with the ideal lattice's sites (two-dimensional lattices only).
    const corrected = analysis.pixelToNm && lattice.kind !== 'line' ? correctedImage(rows, analysis.pixelToNm, 512) : null;
    const sites =
      corrected && lattice.kind !== 'line'
        ? latticeSites(corrected, { kind: lattice.kind, constantNm: lattice.constantNm }, analysis.rotationDeg)
        : [];
    reply = {
      id,
      ok: true,
      result,
      // Other peaks worth seeing: at least a quarter of the strongest [practice].
      candidates: analysis.candidates
        .filter((c) => c.magnitude >= 0.25 * analysis.candidates[0]!.magnitude)
        .map((c) => ({ kx: c.kx, ky: c.ky })),
      spectrum: analysis.spectrum!,
      paddedSize: analysis.paddedSize,
      corrected,
      sites,
      ms: performance.now() - t0,
    };
    (self as unknown as Worker).postMessage(reply, [reply.spectrum.buffer, ...(corrected ? [corrected.data.buffer] : [])]);
    return;
  } catch (err) {
    if (!(err instanceof RangeError)) throw err;
    reply = { id, ok: false, message: err.message, code: err instanceof LatticeError ? err.code : 'invalid_input' };
  }
  (self as unknown as Worker).postMessage(reply);
};
