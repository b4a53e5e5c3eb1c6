import type { RunMethod, RunRecordData } from '@shared/schemas/run.ts';
import { RecordAsRun } from '@/features/builds/components/record/record-as-run.tsx';
import { useSession } from '@/features/session/api/get-session.ts';

/** "Record as a run" under a workbench result, told by the session whether someone is signed in. */
export function RecordRunPanel({ data, defaultMethod }: { data: RunRecordData | null; defaultMethod: RunMethod }) {
  const session = useSession();
  return <RecordAsRun data={data} signedIn={Boolean(session.data?.user)} defaultMethod={defaultMethod} />;
}
