import type { ReactNode } from 'react';
import type { StartTool } from '@shared/workbench/start-links.ts';
import { StartPickers } from './start-pickers.tsx';

/**
 * The inputs column of a workbench page: a form that never submits (results follow the inputs as they change),
 * opened by the "start from" pickers when the page takes a part's or an actuator's figures.
 */
export function ToolInputs({ start, parts, children }: { start?: StartTool; parts?: boolean; children: ReactNode }) {
  return (
    <form noValidate onSubmit={(e) => e.preventDefault()} className="space-y-4">
      {start && <StartPickers tool={start} parts={parts} />}
      {children}
    </form>
  );
}
