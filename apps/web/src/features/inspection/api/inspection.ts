import type { CheckpointDto, InspectionDto, MeasurementDto, MeasurementInputDto, UpdateCheckpointRequest } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const inspectionKey = (jobId: number) => ['jobs', 'detail', jobId, 'inspection'] as const;

export const inspectionQuery = (jobId: number) =>
  queryOptions({ queryKey: inspectionKey(jobId), queryFn: () => api<InspectionDto>(`/jobs/${jobId}/inspection`) });

export const useInspection = (jobId: number) => useQuery(inspectionQuery(jobId));

export function useUpdateCheckpoint(jobId: number, checkpointId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateCheckpointRequest) => api<CheckpointDto>(`/jobs/${jobId}/checkpoints/${checkpointId}`, { method: 'PATCH', body }),
    onSettled: () => qc.invalidateQueries({ queryKey: inspectionKey(jobId) }),
  });
}

/** The server recomputes and stores the verdict; the browser's one is only the live preview. */
export function useAddMeasurement(jobId: number, checkpointId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: MeasurementInputDto) => api<MeasurementDto>(`/jobs/${jobId}/checkpoints/${checkpointId}/measurements`, { method: 'POST', body: input }),
    onSettled: () => qc.invalidateQueries({ queryKey: inspectionKey(jobId) }),
  });
}
