import type { PartCategory } from '@shared/schemas/part-vocabulary.ts';

/** A drawn outline of the part's kind, varied by listing id: bar, disc, stack, tube or a generic block. */
function Shape({ category, seed }: { category: PartCategory; seed: number }) {
  const ink = '#1D232B';
  const body = seed % 2 ? '#B5532A' : '#2F6F73';
  switch (category) {
    case 'bimorph':
    case 'shear-plate':
      return (
        <g>
          <rect x="30" y="44" width="100" height="9" rx="1" fill={body} />
          <rect x="30" y="48" width="100" height="1.5" fill={ink} opacity="0.5" />
          <rect x="22" y="38" width="14" height="21" rx="2" fill={ink} opacity="0.8" />
        </g>
      );
    case 'buzzer-disc':
      return (
        <g>
          <circle cx="80" cy="50" r="30" fill="#C9A55A" />
          <circle cx="80" cy="50" r="20" fill={body} />
          <circle cx="80" cy="50" r="8" fill="#ECE8DF" opacity="0.5" />
        </g>
      );
    case 'stack':
      return (
        <g>
          {Array.from({ length: 9 }, (_, i) => (
            <rect key={i} x="62" y={24 + i * 6} width="36" height="5" fill={i % 2 ? body : ink} opacity={i % 2 ? 1 : 0.7} />
          ))}
        </g>
      );
    case 'tube':
      return (
        <g>
          <rect x="56" y="26" width="48" height="50" fill={body} />
          <ellipse cx="80" cy="26" rx="24" ry="7" fill="#ECE8DF" stroke={body} strokeWidth="3" />
          <ellipse cx="80" cy="76" rx="24" ry="7" fill={body} />
          <line x1="80" y1="33" x2="80" y2="82" stroke="#ECE8DF" strokeWidth="1.5" />
        </g>
      );
    case 'voice-coil':
      return (
        <g>
          {Array.from({ length: 8 }, (_, i) => (
            <ellipse key={i} cx="80" cy={30 + i * 6} rx="26" ry="5" fill="none" stroke={body} strokeWidth="2.5" />
          ))}
        </g>
      );
    default:
      return <rect x="55" y="30" width="50" height="40" rx="4" fill={body} />;
  }
}

/** For listings without photos: a drawn tile in our palette showing what kind of part it is. */
export function ListingTile({ category, seed, className = 'aspect-[16/9]' }: { category: PartCategory; seed: number; className?: string }) {
  return (
    <div className={`overflow-hidden bg-paper-deep ${className}`}>
      <svg viewBox="0 0 160 100" preserveAspectRatio="xMidYMid meet" className="h-full w-full" aria-hidden="true" focusable="false">
        <rect width="160" height="100" fill="#ECE8DF" />
        <g stroke="#D8D3C8" strokeWidth="0.6">
          {[20, 40, 60, 80].map((y) => (
            <line key={y} x1="0" x2="160" y1={y} y2={y} />
          ))}
        </g>
        <Shape category={category} seed={seed} />
      </svg>
    </div>
  );
}
