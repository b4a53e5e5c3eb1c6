import { Link } from 'react-router-dom';
import { createColumnHelper, type RowData } from '@tanstack/react-table';
import { type PartListItemDto, type PartSort } from '@shared/schemas/part.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { paths } from '@/config/paths.ts';
import { formatShort } from '@shared/format/measured-number.ts';

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Right-aligned figures. */
    numeric?: boolean;
    /** Left out of the table on a phone; the name cell repeats it in a line of its own. */
    phoneHidden?: boolean;
  }
}

const col = createColumnHelper<PartListItemDto>();

/** Column ids that the server can sort by, and the sort parameter each direction maps to. */
const SORT_OF: Record<string, { asc: PartSort; desc: PartSort }> = {
  name: { asc: 'name', desc: 'name' },
  gain: { asc: 'gain', desc: '-gain' },
  runs: { asc: 'runs', desc: '-runs' },
};

/** The `sort` parameter for a column and direction (name sorts A–Z only). */
export const toSortParam = (id: string, desc: boolean): PartSort | null => {
  const s = SORT_OF[id];
  return s ? (desc ? s.desc : s.asc) : null;
};

/** The table's sorting state for a `sort` parameter (newest has no column). */
export const toSortingState = (sort: PartSort) => {
  if (sort === 'newest') return [];
  const desc = sort.startsWith('-');
  return [{ id: desc ? sort.slice(1) : sort, desc }];
};

/** Registry columns; every measured number in the num face with its unit. */
export const partColumns = [
  col.accessor('name', {
    id: 'name',
    header: 'Part',
    sortDescFirst: false,
    cell: (c) => (
      <div className="md:min-w-48">
        <Link
          to={paths.part(c.row.original.id)}
          className="font-medium text-copper-dark underline decoration-copper/40 underline-offset-2 hover:decoration-copper"
        >
          {c.getValue()}
        </Link>
        {c.row.original.salvageSource && <p className="mt-0.5 line-clamp-1 text-xs text-ink-soft">from {c.row.original.salvageSource}</p>}
        <p className="mt-0.5 text-xs text-ink-soft md:hidden">
          {partCategoryLabels[c.row.original.category]} · <span className="num">{c.row.original.acceptedRunCount}</span>{' '}
          {c.row.original.acceptedRunCount === 1 ? 'run' : 'runs'} · <span className="num">{c.row.original.buildCount}</span>{' '}
          {c.row.original.buildCount === 1 ? 'build' : 'builds'} ·{' '}
          {c.row.original.safeVolts === null ? (
            'voltage unknown'
          ) : (
            <span className="num">{formatShort(c.row.original.safeVolts)} V safe</span>
          )}
        </p>
      </div>
    ),
  }),
  col.accessor('category', {
    id: 'category',
    header: 'Category',
    enableSorting: false,
    meta: { phoneHidden: true },
    cell: (c) => <span className="whitespace-nowrap">{partCategoryLabels[c.getValue()]}</span>,
  }),
  col.accessor('gainMedianNmPerV', {
    id: 'gain',
    header: 'Median gain',
    sortDescFirst: true,
    meta: { numeric: true },
    cell: (c) => {
      const p = c.row.original;
      if (p.gainMedianNmPerV === null) return <span className="text-ink-soft">no accepted runs</span>;
      return (
        <span className="num whitespace-nowrap">
          <span className="font-semibold">{formatShort(p.gainMedianNmPerV)}</span> nm/V
          {p.gainP25NmPerV !== null && p.gainP75NmPerV !== null && p.acceptedRunCount > 1 && (
            <span className="block text-xs text-ink-soft" title="Interquartile range: the middle half of the accepted runs">
              IQR {formatShort(p.gainP25NmPerV)}–{formatShort(p.gainP75NmPerV)}
            </span>
          )}
        </span>
      );
    },
  }),
  col.accessor('acceptedRunCount', {
    id: 'runs',
    header: 'Accepted runs',
    sortDescFirst: true,
    meta: { numeric: true, phoneHidden: true },
    cell: (c) => <span className="num">{c.getValue()}</span>,
  }),
  col.accessor('buildCount', {
    id: 'builds',
    header: 'Builds',
    enableSorting: false,
    meta: { numeric: true, phoneHidden: true },
    cell: (c) => <span className="num">{c.getValue()}</span>,
  }),
  col.accessor('safeVolts', {
    id: 'volts',
    header: 'Safe voltage',
    enableSorting: false,
    meta: { numeric: true, phoneHidden: true },
    cell: (c) =>
      c.getValue() === null ? (
        <span className="text-ink-soft">unknown</span>
      ) : (
        <span className="num whitespace-nowrap">{formatShort(c.getValue())} V</span>
      ),
  }),
];
