import { Link } from 'react-router-dom';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { startToolTitles } from '@shared/workbench/start-links.ts';
import { workbenchLinksFor } from '../record/actuator-start.ts';

/** "Open in the workbench": the pages this actuator can start, prefilled from its part, newest gain and saved matrix. */
export function WorkbenchLinks({ actuator }: { actuator: ActuatorDto }) {
  const links = workbenchLinksFor(actuator);
  const name = actuator.label || actuator.part.name;
  return (
    <nav aria-label={`Open ${name} in the workbench`} className="flex flex-wrap items-baseline gap-x-3 gap-y-1 text-sm">
      <span className="text-ink-soft">Open in the workbench:</span>
      {links.map((l) => (
        <Link key={l.tool} to={l.href} className="text-teal-dark underline underline-offset-2">
          {startToolTitles[l.tool]}
        </Link>
      ))}
    </nav>
  );
}
