import { flexRender, getCoreRowModel, useReactTable, type Header, type SortingState, type Updater } from '@tanstack/react-table';
import type { PartListDto, PartListItemDto } from '@shared/schemas/part.ts';
import { partColumns, toSortParam, toSortingState } from './parts-columns.tsx';
import type { PartSearch } from './use-part-search.ts';

/** On a phone only the name and the median gain keep columns; the other figures sit in a line under the name. */
const phone = (h: { column: { columnDef: { meta?: { phoneHidden?: boolean } } } }) =>
  h.column.columnDef.meta?.phoneHidden ? 'max-md:hidden' : '';

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
        `${phone(header)}`
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
      <div
        className={`overflow-x-auto rounded-lg border border-rule bg-white transition-opacity ${stale ? 'opacity-60' : ''}`}
        tabIndex={0}
        role="region"
        aria-label="Parts"
        aria-busy={stale}
      >
        <table className="w-full border-collapse text-sm md:min-w-[44rem]">
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
                    className={`px-3 py-2 align-top ${cell.column.columnDef.meta?.numeric ? 'text-right' : ''} ${phone(cell)}`}
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
