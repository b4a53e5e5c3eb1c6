/** An invented example record (1.5 Hz, 20 V drive amplitude, 2.1 µm swing lagging 0.12 rad, a little noise) the page opens with. */
export const exampleSineRecord = [
  'time (s),drive (V),displacement (µm)',
  ...Array.from({ length: 400 }, (_, i) => {
    const t = i / 100;
    const w = 2 * Math.PI * 1.5 * t;
    return `${t.toFixed(2)},${(20 * Math.sin(w) + 0.05 * Math.sin(37 * i)).toFixed(3)},${(2.1 * Math.sin(w - 0.12) + 0.004 * Math.cos(53 * i)).toFixed(4)}`;
  }),
].join('\n');
