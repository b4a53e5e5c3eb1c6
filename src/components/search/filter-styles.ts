/** Look of the search pages' filter controls (16 px text on phones so they do not zoom on focus). */
export const fieldClass = 'w-full rounded-md border border-rule bg-white px-2.5 py-1.5 text-base sm:text-sm';
export const labelClass = 'mb-1 block text-xs font-medium text-ink-soft';
