import type { PhotoDto } from '@shared/schemas/build.ts';

/** A drawn stand-in for a missing cover: surface atoms, a scan trace over them and the probe; varied by build id. */
function DrawnCover({ seed }: { seed: number }) {
  const tipX = 40 + ((seed * 37) % 80);
  const atoms = Array.from({ length: 14 }, (_, i) => 6 + i * 12);
  const tilt = ((seed % 3) - 1) * 5;
  const trace = Array.from({ length: 81 }, (_, i) => {
    const x = i * 2;
    const y = 68 - 2.5 * Math.cos(((x - 6) / 12) * 2 * Math.PI) - tilt * (x / 160);
    return `${i === 0 ? 'M' : 'L'}${x} ${y.toFixed(1)}`;
  }).join(' ');
  return (
    <svg viewBox="0 0 160 100" preserveAspectRatio="xMidYMid slice" className="h-full w-full" aria-hidden="true" focusable="false">
      <rect width="160" height="100" fill="#ECE8DF" />
      <g stroke="#D8D3C8" strokeWidth="0.5">
        {[25, 50, 75].map((y) => (
          <line key={y} x1="0" x2="160" y1={y} y2={y} />
        ))}
      </g>
      <path d={trace} fill="none" stroke="#B5532A" strokeWidth="1.6" />
      <g fill="#2F6F73" opacity="0.75">
        {atoms.map((x) => (
          <circle key={x} cx={x} cy="84" r="4.5" />
        ))}
      </g>
      <rect x={tipX - 60} y="30" width="14" height="10" rx="1" fill="#2F6F73" />
      <rect x={tipX - 46} y="34" width="46" height="3" fill="#1D232B" />
      <path d={`M${tipX - 6} 37h6l-3 14z`} fill="#B5532A" />
    </svg>
  );
}

/** The cover photo's thumbnail, or a drawn tile in our palette when the build has none. */
export function CoverTile({ cover, seed }: { cover: PhotoDto | null; seed: number }) {
  return (
    <div className="aspect-[16/9] w-full shrink-0 overflow-hidden bg-paper-deep">
      {cover ? (
        <img src={cover.thumbUrl} alt={cover.alt} loading="lazy" className="h-full w-full object-cover" />
      ) : (
        <DrawnCover seed={seed} />
      )}
    </div>
  );
}
