import { flexRender, getCoreRowModel, useReactTable, type Header, type SortingState, type Updater } from '@tanstack/react-table';
import type { PartListDto, PartListItemDto } from '@shared/schemas/part.ts';
import { partColumns, toSortParam, toSortingState } from './parts-columns.tsx';
import type { PartSearch } from './use-part-search.ts';

/** The part's name stays in view while the figures scroll sideways on a phone. */
const STICKY = 'max-md:sticky max-md:left-0 max-md:z-[1] max-md:shadow-[1px_0_0_var(--color-rule)]';

const ariaSort = (h: Header<PartListItemDto, unknown>) => {
  const s = h.column.getIsSorted();
  return s === 'asc' ? 'ascending' : s === 'desc' ? 'descending' : h.column.getCanSort() ? 'none' : undefined;
};

function HeaderCell({ header }: { header: Header<PartListItemDto, unknown> }) {
  const numeric = header.column.columnDef.meta?.numeric;
  const label = flexRender(header.column.columnDef.header, header.getContext());
  const sorted = header.column.getIsSorted();
  return (
    <th
      scope="col"
      aria-sort={ariaSort(header)}
      className={
        `whitespace-nowrap border-b-2 border-ink/70 bg-paper-deep px-3 py-2 text-xs font-semibold uppercase ` +
        `tracking-wide text-ink-soft ${numeric ? 'text-right' : 'text-left'} ` +
        `${header.column.id === 'name' ? STICKY : ''}`
      }
    >
      {header.column.getCanSort() ? (
        <button
          type="button"
          onClick={header.column.getToggleSortingHandler()}
          className="inline-flex items-center gap-1 uppercase hover:text-copper-dark"
        >
          {label}
          <span aria-hidden="true" className={sorted ? 'text-copper' : 'text-rule'}>
            {sorted === 'desc' ? '▼' : sorted === 'asc' ? '▲' : '◆'}
          </span>
        </button>
      ) : (
        label
      )}
    </th>
  );
}

/** The registry table: the server filters, sorts and pages; headers with arrows set `sort` in the URL. */
export function PartsTable({ data, search, stale }: { data: PartListDto; search: PartSearch; stale: boolean }) {
  const sorting = toSortingState(search.sort);
  const table = useReactTable({
    data: data.items,
    columns: partColumns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    rowCount: data.total,
    state: { sorting, pagination: { pageIndex: data.page - 1, pageSize: data.pageSize } },
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0];
      const sort = first ? toSortParam(first.id, first.desc) : null;
      if (sort) search.setSort(sort);
    },
  });
  return (
    <div>
      <p className="mb-1 text-xs text-ink-soft md:hidden">Swipe the table sideways for gains, runs and voltages.</p>
      <div
        className={`overflow-x-auto rounded-lg border border-rule bg-white transition-opacity ${stale ? 'opacity-60' : ''}`}
        tabIndex={0}
        role="region"
        aria-label="Parts, scrolls sideways on narrow screens"
      >
        <table className="w-full min-w-[44rem] border-collapse text-sm">
          <caption className="sr-only">Listed parts with pooled figures from accepted calibration runs</caption>
          <thead>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id}>
                {g.headers.map((h) => (
                  <HeaderCell key={h.id} header={h} />
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-rule last:border-b-0">
                {row.getVisibleCells().map((cell) => (
                  <td
                    key={cell.id}
                    className={`px-3 py-2 align-top ${cell.column.columnDef.meta?.numeric ? 'text-right' : ''} ${cell.column.id === 'name' ? `${STICKY} bg-white` : ''}`}
                  >
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
