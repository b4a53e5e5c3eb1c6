/** The editor's sections, as anchors that also work on a phone (the bar scrolls sideways). */
export const EDITOR_SECTIONS = [
  { id: 'details', label: 'Details' },
  { id: 'entries', label: 'Log entries' },
  { id: 'photos', label: 'Photos' },
  { id: 'actuators', label: 'Actuators & runs' },
  { id: 'review', label: 'Review' },
] as const;

/** Sticky links to the editor's sections. */
export function EditorNav() {
  return (
    <nav
      aria-label="Build editor sections"
      className="sticky top-0 z-20 -mx-4 mb-6 border-b border-rule bg-paper/95 px-4 py-2 backdrop-blur"
    >
      <ul className="flex gap-1 overflow-x-auto whitespace-nowrap">
        {EDITOR_SECTIONS.map((s) => (
          <li key={s.id}>
            <a href={`#${s.id}`} className="block rounded px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-deep">
              {s.label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}
