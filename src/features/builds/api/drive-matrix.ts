import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import type { DriveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Save a two-axis mixer result onto an XY-pair actuator (replaces an earlier one). */
export function useSaveDriveMatrix() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ actuatorId, input }: { actuatorId: number; input: DriveMatrixInput }) =>
      api.put<ActuatorDto>(`/api/actuators/${actuatorId}/drive-matrix`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Remove the saved mixer result from an actuator. */
export function useClearDriveMatrix() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (actuatorId: number) => api.delete<void>(`/api/actuators/${actuatorId}/drive-matrix`),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
