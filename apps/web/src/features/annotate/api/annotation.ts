import type { AnnotationDto, ChainFromPhotoRequest, MeasurementDto, SaveAnnotationRequest } from '@benchproof/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const annotationKeys = { one: (mediaId: number) => ['annotations', mediaId] as const };

export const annotationQuery = (mediaId: number) =>
  queryOptions({ queryKey: annotationKeys.one(mediaId), queryFn: () => api<AnnotationDto>(`/annotations/${mediaId}`), staleTime: Infinity });

export const useAnnotation = (mediaId: number) => useQuery(annotationQuery(mediaId));

/** Saves a new version; the cache takes the answer so the next save builds on it. */
export function useSaveAnnotation(mediaId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SaveAnnotationRequest) => api<AnnotationDto>(`/annotations/${mediaId}`, { method: 'PUT', body }),
    onSuccess: (dto) => qc.setQueryData(annotationKeys.one(mediaId), dto),
  });
}

/** Records chain wear from a saved ruler on the job's chain checkpoint, with the photo as evidence. */
export function useChainReading(mediaId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ChainFromPhotoRequest) => api<MeasurementDto>(`/annotations/${mediaId}/chain-reading`, { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['jobs'] }),
  });
}

/** URL of the server's annotated render (report, owner page and thumbnails use the same). */
export const annotatedUrl = (mediaId: number, size: 'screen' | 'print', version: number) => `/api/media/${mediaId}/annotated/${size}?v=${version}`;
