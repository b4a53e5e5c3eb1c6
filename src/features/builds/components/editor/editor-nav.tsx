import { useEffect, useRef, useState } from 'react';

/** The editor's sections, as anchors that also work on a phone (the bar scrolls sideways). */
export const EDITOR_SECTIONS = [
  { id: 'details', label: 'Details' },
  { id: 'entries', label: 'Log entries' },
  { id: 'photos', label: 'Photos' },
  { id: 'actuators', label: 'Actuators & runs' },
  { id: 'review', label: 'Review' },
] as const;

/**
 * Sticky links to the editor's sections. When they do not fit (a phone), the bar scrolls sideways and shows it:
 * the cut edge fades and a "more →" mark stands at the end until the last link is in view.
 */
export function EditorNav() {
  const list = useRef<HTMLUListElement>(null);
  const [more, setMore] = useState(false);
  useEffect(() => {
    const el = list.current;
    if (!el) return;
    const check = () => setMore(el.scrollLeft + el.clientWidth < el.scrollWidth - 2);
    check();
    el.addEventListener('scroll', check, { passive: true });
    window.addEventListener('resize', check);
    return () => {
      el.removeEventListener('scroll', check);
      window.removeEventListener('resize', check);
    };
  }, []);
  return (
    <nav
      aria-label="Build editor sections"
      className="sticky top-0 z-20 -mx-4 mb-6 border-b border-rule bg-paper/95 px-4 py-2 backdrop-blur"
    >
      <div className="relative">
        <ul ref={list} className="flex gap-1 overflow-x-auto whitespace-nowrap">
          {EDITOR_SECTIONS.map((s) => (
            <li key={s.id}>
              <a href={`#${s.id}`} className="block rounded px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-deep">
                {s.label}
              </a>
            </li>
          ))}
        </ul>
        {more && (
          <span
            aria-hidden="true"
            className="pointer-events-none absolute inset-y-0 right-0 flex items-center bg-gradient-to-l from-paper from-60% pl-8 text-xs font-semibold text-copper-dark"
          >
            more →
          </span>
        )}
      </div>
    </nav>
  );
}
