// One assertion for a refusal: the status, the error code the server answers with, a message, and for
// validation errors the field the test is about. The body is always `{ error: { code, message, details? } }`;
// `details` lists field issues as `{ path: 'points.3.volts', message, code? }` (see server/middleware/error-handler.ts).
import { expect } from 'vitest';
import type request from 'supertest';

/** A field path as `details` spells it ('points.3.volts') or as its parts (['points', 3, 'volts']). */
export type FieldPath = string | ReadonlyArray<string | number>;

interface Issue {
  path: string;
}

/**
 * Assert that `res` is the refusal `status` with error `code` and a non-empty message; with `fieldPath`,
 * that one of the issues in `details` is about that field. Returns the response for further checks.
 */
export function expectError(res: request.Response, status: number, code: string, fieldPath?: FieldPath): request.Response {
  const where = `${res.status} ${res.text.slice(0, 500)}`;
  expect(res.status, where).toBe(status);
  expect(res.body, where).toMatchObject({ error: { code, message: expect.stringMatching(/\S/) } });
  if (fieldPath !== undefined) {
    const path = typeof fieldPath === 'string' ? fieldPath : fieldPath.join('.');
    const details: unknown = res.body.error.details;
    expect(Array.isArray(details), `${where}: no details`).toBe(true);
    expect(
      (details as Issue[]).map((d) => d.path),
      where,
    ).toContain(path);
  }
  return res;
}
