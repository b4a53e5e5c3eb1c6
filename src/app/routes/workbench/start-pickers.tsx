import type { DriveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import type { StartTool } from '@shared/workbench/start-links.ts';
import { SaveDriveMatrix } from '@/features/builds/components/record/save-drive-matrix.tsx';
import { StartFromActuator } from '@/features/builds/components/record/start-from-actuator.tsx';
import { useSession } from '@/features/session/api/get-session.ts';
import { StartFromPart } from '@/features/workbench/prefill/start-from-part.tsx';

/** "Start from a part" (unless `parts` is false) and, for a signed-in maker, "Start from my actuator". */
export function StartPickers({ tool, parts = true }: { tool: StartTool; parts?: boolean }) {
  const session = useSession();
  return (
    <>
      {parts && <StartFromPart tool={tool} />}
      <StartFromActuator tool={tool} signedIn={Boolean(session.data?.user)} />
    </>
  );
}

/** "Save onto an actuator" under the mixer's result, told by the session whether someone is signed in. */
export function SaveDriveMatrixPanel({ matrix }: { matrix: DriveMatrixInput | null }) {
  const session = useSession();
  return <SaveDriveMatrix matrix={matrix} signedIn={Boolean(session.data?.user)} />;
}
