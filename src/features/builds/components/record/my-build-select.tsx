import { useQuery } from '@tanstack/react-query';
import { Field, describe, inputClass } from '@/components/ui/form-bits.tsx';
import { buildQueries } from '../../api/build-queries.ts';

/** Builds that can still change: drafts, returned and published builds (those pending review or declined are frozen). */
const CHANGEABLE = new Set(['draft', 'returned', 'published']);

/** A select of my builds that can still change, for panels that put a workbench result into one of them. */
export function MyBuildSelect({ id, value, onChange }: { id: string; value: number | null; onChange: (buildId: number | null) => void }) {
  const mine = useQuery(buildQueries.mine());
  const builds = (mine.data?.items ?? []).filter((b) => CHANGEABLE.has(b.status));
  const empty = builds.length === 0 && mine.isSuccess;
  return (
    <Field id={id} label="Build" hint={empty ? 'No build of yours can change now: start one first.' : undefined}>
      <select
        id={id}
        className={inputClass}
        value={value ?? ''}
        {...describe(id, undefined, empty)}
        onChange={(e) => onChange(e.target.value ? Number(e.target.value) : null)}
      >
        <option value="">{mine.isPending ? 'Loading your builds…' : 'Choose a build'}</option>
        {builds.map((b) => (
          <option key={b.id} value={b.id}>
            {b.title} ({b.status})
          </option>
        ))}
      </select>
    </Field>
  );
}
