import { Link } from 'react-router-dom';
import type { AuditEntryDto } from '@shared/schemas/review.ts';
import { paths } from '@/config/paths.ts';
import { TargetLink } from '../target-link.tsx';
import { formatDateTime } from '@shared/format/dates.ts';
import { actionLabel, targetTypeLabels } from './audit-labels.ts';

const cell =
  'flex gap-3 py-0.5 align-top before:w-24 before:shrink-0 before:text-ink-soft before:content-[attr(data-label)] sm:table-cell sm:px-2 sm:py-2 sm:before:content-none';

/** Audit entries as a table on wide screens and as labelled blocks on a phone. */
export function AuditTable({ items }: { items: AuditEntryDto[] }) {
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">Audit trail entries, newest first</caption>
      <thead className="hidden text-left text-xs uppercase tracking-wide text-ink-soft sm:table-header-group">
        <tr className="border-b border-rule">
          <th scope="col" className="px-2 py-2">
            When
          </th>
          <th scope="col" className="px-2 py-2">
            By
          </th>
          <th scope="col" className="px-2 py-2">
            Action
          </th>
          <th scope="col" className="px-2 py-2">
            Thing
          </th>
          <th scope="col" className="px-2 py-2">
            Note
          </th>
        </tr>
      </thead>
      <tbody>
        {items.map((e) => (
          <tr key={e.id} className="block border-b border-rule py-2 last:border-0 sm:table-row sm:py-0">
            <td data-label="When" className={cell}>
              <span className="num whitespace-nowrap">{formatDateTime(e.createdAt)}</span>
            </td>
            <td data-label="By" className={`${cell} sm:whitespace-nowrap`}>
              <Link
                className="underline decoration-rule hover:text-copper"
                to={`${paths.reviewAudit}?actorId=${e.actor.id}`}
                title={`Only ${e.actor.login}’s entries`}
              >
                {e.actor.login}
              </Link>
            </td>
            <td data-label="Action" className={cell}>
              {actionLabel(e.action)}
            </td>
            <td data-label="Thing" className={cell}>
              <TargetLink type={e.targetType} id={e.targetId}>
                {e.targetLabel ?? (
                  <>
                    {targetTypeLabels[e.targetType] ?? e.targetType} <span className="num">#{e.targetId}</span>
                  </>
                )}
              </TargetLink>
            </td>
            <td data-label="Note" className={cell}>
              <span className="min-w-0 whitespace-pre-line break-words">{e.note || <span className="text-ink-soft">—</span>}</span>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
