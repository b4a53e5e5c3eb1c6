import { useEffect, useId, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { partStartSearch, type StartTool } from '@shared/workbench/start-links.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { paths } from '@/config/paths.ts';
import { partQueries } from '@/lib/part-queries.ts';

const SEARCH_DELAY_MS = 300;

/**
 * "Start from a part": search the registry and fill the page with the part's stored geometry and material,
 * through the page's URL inputs (the same address the part page's "Open in the workbench" links to).
 */
export function StartFromPart({ tool }: { tool: StartTool }) {
  const id = useId();
  const navigate = useNavigate();
  const qc = useQueryClient();
  const [text, setText] = useState('');
  const [q, setQ] = useState('');
  const [failed, setFailed] = useState(false);
  useEffect(() => {
    const timer = setTimeout(() => setQ(text.trim()), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [text]);
  const list = useQuery({ ...partQueries.list({ q, pageSize: 8 }), enabled: q.length > 0 });
  const handlePick = async (partId: number) => {
    try {
      const part = await qc.fetchQuery(partQueries.detail(partId));
      setFailed(false);
      void navigate({ pathname: paths.workbenchTool(tool), search: partStartSearch(tool, part) });
    } catch {
      setFailed(true);
    }
  };
  const items = q ? (list.data?.items ?? []) : [];
  return (
    <details className="rounded-lg border border-rule bg-white p-4 text-sm">
      <summary className="cursor-pointer font-semibold">Start from a part</summary>
      <label htmlFor={id} className="mt-3 block font-medium">
        Search the registry
      </label>
      <input
        id={id}
        type="search"
        value={text}
        onChange={(e) => setText(e.target.value)}
        placeholder="Name, material or source"
        className="mt-1 w-full rounded-md border border-rule bg-white px-2 py-1.5"
      />
      <p className="mt-1 text-xs text-ink-soft">
        Fills the geometry and material the part has on record; what it lacks keeps its value here.
      </p>
      {q && list.isSuccess && items.length === 0 && <p className="mt-2 text-ink-soft">No part matches.</p>}
      {failed && (
        <p role="alert" className="mt-2 text-danger">
          That part could not be loaded; try again.
        </p>
      )}
      {items.length > 0 && (
        <ul aria-label="Matching parts" className="mt-2 divide-y divide-rule rounded-md border border-rule">
          {items.map((p) => (
            <li key={p.id}>
              <button type="button" className="w-full px-3 py-2 text-left hover:bg-paper-deep" onClick={() => void handlePick(p.id)}>
                <span className="font-medium">{p.name}</span>{' '}
                <span className="text-ink-soft">
                  · {partCategoryLabels[p.category]}
                  {p.material ? ` · ${p.material}` : ''}
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </details>
  );
}
