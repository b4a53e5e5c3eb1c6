import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { actuatorStartSearch, startToolsForActuator, type ActuatorForStart, type StartTool } from '@shared/workbench/start-links.ts';
import { paths } from '@/config/paths.ts';

/** The gain a workbench page starts from: the newest accepted run's, else the newest run's (runs come newest first). */
export function newestGain(a: ActuatorDto): number | null {
  const run = a.runs.find((r) => r.status === 'accepted') ?? a.runs[0];
  return run ? run.fit.gainNmPerV : null;
}

/** What a workbench start link needs of an actuator. */
export function actuatorForStart(a: ActuatorDto): ActuatorForStart {
  return { part: a.part, axis: a.axis, drive: a.drive, measuredGainNmPerV: newestGain(a), driveMatrix: a.driveMatrix };
}

/** Workbench pages this actuator can open, each with its prefilled address. */
export function workbenchLinksFor(a: ActuatorDto): { tool: StartTool; href: string }[] {
  const start = actuatorForStart(a);
  return startToolsForActuator(start).map((tool) => ({ tool, href: `${paths.workbenchTool(tool)}${actuatorStartSearch(tool, start)}` }));
}
