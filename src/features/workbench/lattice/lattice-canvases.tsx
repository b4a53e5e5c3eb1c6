import { useEffect, useRef } from 'react';
import type { CorrectedImage } from '@shared/workbench/lattice-corrected.ts';

/** Grey-scale picture of a height image, lowest black, highest white. */
export function HeightImage({ rows, label }: { rows: readonly ArrayLike<number>[]; label: string }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const height = rows.length;
  const width = rows[0]?.length ?? 0;
  useEffect(() => {
    const canvas = ref.current;
    const ctx = canvas?.getContext('2d');
    if (!canvas || !ctx || width === 0) return;
    let lo = Infinity;
    let hi = -Infinity;
    for (const row of rows)
      for (let i = 0; i < row.length; i++) {
        const v = row[i]!;
        if (v < lo) lo = v;
        if (v > hi) hi = v;
      }
    const span = hi > lo ? hi - lo : 1;
    const img = ctx.createImageData(width, height);
    rows.forEach((row, y) => {
      for (let x = 0; x < width; x++) {
        const g = Math.round(((row[x]! - lo) / span) * 255);
        const i = (y * width + x) * 4;
        img.data[i] = img.data[i + 1] = img.data[i + 2] = g;
        img.data[i + 3] = 255;
      }
    });
    ctx.putImageData(img, 0, 0);
  }, [rows, width, height]);
  return (
    <canvas
      ref={ref}
      width={width}
      height={height}
      role="img"
      aria-label={label}
      className="w-full max-w-md rounded border border-rule [image-rendering:pixelated]"
    />
  );
}

/**
 * The spectrum's log-magnitude, DC in the centre, with the chosen peaks ringed (teal) and the other strong
 * peaks ringed thinly (amber); both signs of each reciprocal vector are marked.
 */
export function SpectrumImage({
  spectrum,
  size,
  peaks,
  others,
}: {
  spectrum: Float32Array;
  size: number;
  peaks: readonly { kx: number; ky: number }[];
  others: readonly { kx: number; ky: number }[];
}) {
  const ref = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const canvas = ref.current;
    const ctx = canvas?.getContext('2d');
    if (!canvas || !ctx) return;
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < spectrum.length; i++) {
      const v = spectrum[i]!;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    const span = hi > lo ? hi - lo : 1;
    const img = ctx.createImageData(size, size);
    for (let i = 0; i < spectrum.length; i++) {
      const g = Math.round(((spectrum[i]! - lo) / span) * 255);
      img.data[4 * i] = img.data[4 * i + 1] = img.data[4 * i + 2] = g;
      img.data[4 * i + 3] = 255;
    }
    ctx.putImageData(img, 0, 0);
    const ring = (k: { kx: number; ky: number }, colour: string, width: number) => {
      for (const s of [1, -1]) {
        ctx.beginPath();
        ctx.arc(size / 2 + s * k.kx * size, size / 2 + s * k.ky * size, Math.max(4, size / 40), 0, 2 * Math.PI);
        ctx.strokeStyle = colour;
        ctx.lineWidth = width;
        ctx.stroke();
      }
    };
    others.forEach((k) => ring(k, '#d97706', Math.max(1, size / 512)));
    peaks.forEach((k) => ring(k, '#0d9488', Math.max(2, size / 200)));
  }, [spectrum, size, peaks, others]);
  return (
    <canvas
      ref={ref}
      width={size}
      height={size}
      role="img"
      aria-label={`Spectrum of the image, log scale, zero frequency in the centre; the ${peaks.length === 1 ? 'chosen peak is' : 'chosen peaks are'} ringed`}
      className="w-full max-w-md rounded border border-rule"
    />
  );
}

/** The image redrawn on a square nm grid (outside the scan: paper colour) with the ideal lattice's sites as dots. */
export function CorrectedImageCanvas({
  image,
  sites,
  label,
}: {
  image: CorrectedImage;
  sites: readonly { x: number; y: number }[];
  label: string;
}) {
  const ref = useRef<HTMLCanvasElement>(null);
  const { width, height, data } = image;
  useEffect(() => {
    const ctx = ref.current?.getContext('2d');
    if (!ctx) return;
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < data.length; i++) {
      const v = data[i]!;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    const span = hi > lo ? hi - lo : 1;
    const img = ctx.createImageData(width, height);
    for (let i = 0; i < data.length; i++) {
      const v = data[i]!;
      const g = Number.isNaN(v) ? 250 : Math.round(((v - lo) / span) * 255);
      img.data[4 * i] = img.data[4 * i + 1] = img.data[4 * i + 2] = g;
      img.data[4 * i + 3] = 255;
    }
    ctx.putImageData(img, 0, 0);
    ctx.fillStyle = '#0d9488';
    const r = Math.max(1, Math.min(3, width / 200));
    for (const p of sites) {
      ctx.beginPath();
      ctx.arc(p.x, p.y, r, 0, 2 * Math.PI);
      ctx.fill();
    }
  }, [data, width, height, sites]);
  return (
    <canvas ref={ref} width={width} height={height} role="img" aria-label={label} className="w-full max-w-md rounded border border-rule" />
  );
}
