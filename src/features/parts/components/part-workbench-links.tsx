import { Link } from 'react-router-dom';
import type { PartDetailDto } from '@shared/schemas/part.ts';
import { partStartSearch, startToolTitles, startToolsForPart } from '@shared/workbench/start-links.ts';
import { paths } from '@/config/paths.ts';

/** "Open in the workbench": the calculators this part's stored geometry and material can fill. */
export function PartWorkbenchLinks({ part }: { part: PartDetailDto }) {
  return (
    <nav aria-label="Open in the workbench" className="flex flex-wrap items-baseline gap-x-3 gap-y-1 text-sm">
      <span className="font-medium">Open in the workbench:</span>
      {startToolsForPart(part).map((tool) => (
        <Link
          key={tool}
          to={`${paths.workbenchTool(tool)}${partStartSearch(tool, part)}`}
          className="text-teal-dark underline underline-offset-2"
        >
          {startToolTitles[tool]}
        </Link>
      ))}
    </nav>
  );
}
