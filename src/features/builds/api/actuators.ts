import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ActuatorDto, CreateActuatorInput, UpdateActuatorInput } from '@shared/schemas/actuator.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** Add an actuator (a part on an axis, with its drive) to a build. */
export function useCreateActuator(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateActuatorInput) => api.post<ActuatorDto>(`/api/builds/${buildId}/actuators`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Change an actuator's part, axis, drive, amplifier, limits or notes. */
export function useUpdateActuator() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ actuatorId, ...input }: UpdateActuatorInput & { actuatorId: number }) =>
      api.patch<ActuatorDto>(`/api/actuators/${actuatorId}`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}

/** Remove an actuator with its calibration runs. */
export function useDeleteActuator() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (actuatorId: number) => api.delete<void>(`/api/actuators/${actuatorId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: buildQueries.all }),
  });
}
