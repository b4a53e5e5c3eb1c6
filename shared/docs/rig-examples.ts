// The "post a run from your rig" examples: one request body, and the curl command and Python script
// built from it. The API reference page shows these strings and the OpenAPI test validates the body
// (and the JSON inside each script) against the run schema, so an example that stops working fails a test.

/** A small calibration curve read with a capacitive sensor: 0–40 V up and back down, nm. */
export const RIG_RUN_BODY = {
  kind: 'points',
  method: 'capacitive',
  voltageUnit: 'V',
  displacementUnit: 'nm',
  points: [
    { volts: 0, displacement: 0.4, sweep: 'up' },
    { volts: 10, displacement: 101.9, sweep: 'up' },
    { volts: 20, displacement: 204.6, sweep: 'up' },
    { volts: 30, displacement: 309.8, sweep: 'up' },
    { volts: 40, displacement: 413.1, sweep: 'up' },
    { volts: 30, displacement: 318.2, sweep: 'down' },
    { volts: 20, displacement: 214.0, sweep: 'down' },
    { volts: 10, displacement: 108.7, sweep: 'down' },
    { volts: 0, displacement: 2.1, sweep: 'down' },
  ],
} as const;

/** The actuator id the examples post to; the page tells readers to use their own. */
export const EXAMPLE_ACTUATOR_ID = 42;

/** curl: the token from the environment, a fresh Idempotency-Key, the body inline. */
export function rigCurlExample(origin: string): string {
  return [
    `curl -sS -X POST "${origin}/api/actuators/${EXAMPLE_ACTUATOR_ID}/runs" \\`,
    `  -H "Authorization: Bearer $SCANWRIGHT_TOKEN" \\`,
    `  -H "Content-Type: application/json" \\`,
    `  -H "Idempotency-Key: $(uuidgen)" \\`,
    `  --data '${JSON.stringify(RIG_RUN_BODY)}'`,
  ].join('\n');
}

/** Python 3, standard library only: one key per run, so a retry after a lost answer never stores it twice. */
export function rigPythonExample(origin: string): string {
  const body = JSON.stringify(RIG_RUN_BODY, null, 4)
    .split('\n')
    .map((line, i) => (i === 0 ? line : `    ${line}`))
    .join('\n');
  return `#!/usr/bin/env python3
"""Post one calibration run to Scanwright (standard library only)."""
import json
import os
import urllib.error
import urllib.request
import uuid

BASE = "${origin}"
TOKEN = os.environ["SCANWRIGHT_TOKEN"]  # a rig token with the runs:write scope
ACTUATOR_ID = ${EXAMPLE_ACTUATOR_ID}  # from your build editor


def post_run(run, key):
    request = urllib.request.Request(
        f"{BASE}/api/actuators/{ACTUATOR_ID}/runs",
        data=json.dumps(run).encode("utf-8"),
        method="POST",
        headers={
            "Authorization": f"Bearer {TOKEN}",
            "Content-Type": "application/json",
            "Idempotency-Key": key,
        },
    )
    with urllib.request.urlopen(request, timeout=60) as response:
        return json.load(response)


if __name__ == "__main__":
    run = ${body}
    key = str(uuid.uuid4())  # keep it for retries of this same run
    try:
        stored = post_run(run, key)
    except urllib.error.HTTPError as err:
        problem = json.load(err)["error"]
        raise SystemExit(f"{err.code} {problem['code']}: {problem['message']}")
    fit = stored["fit"]
    print(f"run {stored['id']} stored ({stored['status']}): {fit['gainNmPerV']:.4g} nm/V")
`;
}

/** The JSON body a curl or Python example carries, read back out of its text (for the test). */
export function bodyInExample(text: string): unknown {
  const curl = /--data '(.+)'$/m.exec(text);
  if (curl) return JSON.parse(curl[1]!);
  const py = /^ {4}run = (\{[\s\S]*?^ {4}\})$/m.exec(text);
  if (py) return JSON.parse(py[1]!);
  throw new Error('no request body found in the example');
}
