import { Suspense, useState } from 'react';
import type { RunRecordData } from '@shared/schemas/run.ts';
import type { RunMethod } from '@shared/schemas/run-vocabulary.ts';
import { LazyRecordAsRun } from '@/features/builds/components/record/lazy-record-as-run.ts';
import { RecordRunInvite } from '@/features/builds/components/record/record-run-invite.tsx';
import { useSession } from '@/features/session/api/get-session.ts';

/** "Record as a run" under a workbench result: an invitation told by the session whether someone is signed in, then the form. */
export function RecordRunPanel({ data, defaultMethod }: { data: RunRecordData | null; defaultMethod: RunMethod }) {
  const session = useSession();
  const signedIn = Boolean(session.data?.user);
  const [open, setOpen] = useState(false);
  if (!signedIn || !open) return <RecordRunInvite signedIn={signedIn} ready={Boolean(data)} onOpen={() => setOpen(true)} />;
  return (
    <Suspense fallback={<p className="rounded-lg border border-rule bg-white p-4 text-sm text-ink-soft">Opening the form…</p>}>
      <LazyRecordAsRun data={data} defaultMethod={defaultMethod} onClose={() => setOpen(false)} />
    </Suspense>
  );
}
