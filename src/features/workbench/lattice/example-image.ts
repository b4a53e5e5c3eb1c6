// The page's starting image: an invented hexagonal lattice (0.246 nm at 0.02 nm/px, turned 8°) with a tilt
// and a little seeded noise, 128 × 128 [calc, invented] — replace it with your own image.
export function exampleLatticeRows(): Float64Array[] {
  const n = 128;
  const len = 2 / (Math.sqrt(3) * 0.246);
  const waves = [38, 98, 158].map((d) => [len * Math.cos((d * Math.PI) / 180), len * Math.sin((d * Math.PI) / 180)] as const);
  let seed = 18;
  const rnd = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648 - 0.5;
  return Array.from({ length: n }, (_, r) => {
    const row = new Float64Array(n);
    for (let c = 0; c < n; c++) {
      const x = 0.02 * c;
      const y = 0.0205 * r;
      row[c] = 0.01 * c + waves.reduce((z, [bx, by]) => z + Math.cos(2 * Math.PI * (bx * x + by * y)), 0) + 0.4 * rnd();
    }
    return row;
  });
}
