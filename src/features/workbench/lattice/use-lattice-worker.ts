import { useEffect, useRef, useState } from 'react';
import type { LatticeReply, LatticeRequest } from './lattice-messages.ts';

export type LatticeState = { status: 'idle' } | { status: 'running' } | { status: 'done'; reply: LatticeReply };

/** Sends each new request to one worker and keeps only the answer to the latest. */
export function useLatticeWorker(request: Omit<LatticeRequest, 'id'> | null): LatticeState {
  const worker = useRef<Worker | null>(null);
  const latest = useRef(0);
  const [state, setState] = useState<LatticeState>({ status: 'idle' });
  useEffect(() => {
    const w = new Worker(new URL('./lattice.worker.ts', import.meta.url), { type: 'module' });
    worker.current = w;
    w.onmessage = (e: MessageEvent<LatticeReply>) => {
      if (e.data.id === latest.current) setState({ status: 'done', reply: e.data });
    };
    return () => w.terminate();
  }, []);
  useEffect(() => {
    if (!request || !worker.current) return;
    const id = ++latest.current;
    setState({ status: 'running' });
    worker.current.postMessage({ ...request, id } satisfies LatticeRequest);
  }, [request]);
  return state;
}
