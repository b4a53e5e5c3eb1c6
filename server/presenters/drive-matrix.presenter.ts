import { storedDriveMatrix, type DriveMatrixDto } from '@shared/schemas/drive-matrix.ts';

/** The saved mixer result of an actuator from its JSON column; a missing or unreadable value shows as none. */
export function presentDriveMatrix(json: string | null | undefined): DriveMatrixDto | null {
  if (!json) return null;
  try {
    const parsed = storedDriveMatrix.safeParse(JSON.parse(json));
    return parsed.success ? (parsed.data as DriveMatrixDto) : null;
  } catch {
    return null;
  }
}
