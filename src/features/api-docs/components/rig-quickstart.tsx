import { Link } from 'react-router-dom';
import { EXAMPLE_ACTUATOR_ID, rigCurlExample, rigPythonExample } from '@shared/docs/rig-examples.ts';
import { paths } from '@/config/paths.ts';
import { CodeBlock } from './code-block.tsx';

/** "Post a run from your rig": token, curl, and a standard-library Python script, from the examples the API test checks. */
export function RigQuickstart({ origin }: { origin: string }) {
  return (
    <section aria-labelledby="rig-title" className="space-y-3 rounded-lg border border-copper/40 bg-white p-4">
      <h2 id="rig-title" className="text-lg font-semibold">
        Post a run from your rig
      </h2>
      <ol className="list-decimal space-y-1 pl-5 text-sm">
        <li>
          Make a rig token with the <code className="font-mono">runs:write</code> scope under “Rig tokens” on your{' '}
          <Link to={paths.account} className="text-copper-dark underline">
            account page
          </Link>
          . It is shown once; keep it in an environment variable, e.g. <code className="font-mono">SCANWRIGHT_TOKEN</code>.
        </li>
        <li>
          Find the actuator’s id in your build editor (the examples use {EXAMPLE_ACTUATOR_ID}). Runs go to{' '}
          <code className="font-mono">POST /api/actuators/{'{actuatorId}'}/runs</code> and wait for review like any other.
        </li>
        <li>
          Send a fresh <code className="font-mono">Idempotency-Key</code> per run and reuse it when you retry: the same key and body within
          24 hours give back the first answer instead of a second run.
        </li>
      </ol>
      <CodeBlock label="curl" code={rigCurlExample(origin)} />
      <CodeBlock label="Python 3, standard library only (post_run.py)" code={rigPythonExample(origin)} />
      <p className="text-xs text-ink-soft">
        A wrong or revoked token gets 401 <code className="font-mono">invalid_token</code>, a token without the scope 403{' '}
        <code className="font-mono">token_scope</code>, bad points 400 <code className="font-mono">validation_failed</code> with the fields
        in <code className="font-mono">details</code>. Each token may send 120 requests a minute.
      </p>
    </section>
  );
}
