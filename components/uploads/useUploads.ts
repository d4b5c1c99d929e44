/**
 * The layout's reference files in the browser: the list (TanStack Query), deleting one, placing
 * a photo under the plan. One query key per layout so the sheet page and the editor's tracing
 * panel stay in step. Never talks to anything but our own routes.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api/client-fetch';
import type { UploadDto } from '@/lib/uploads/dto';
import type { TracingPlacement } from '@/lib/tracing/calibration';

export const uploadsKey = (layoutId: string) => ['uploads', layoutId] as const;

export function useUploads(layoutId: string) {
  return useQuery({
    queryKey: uploadsKey(layoutId),
    queryFn: () => apiFetch<{ uploads: UploadDto[] }>(`/api/layouts/${encodeURIComponent(layoutId)}/uploads`).then((r) => r.uploads),
  });
}

export function useUploadActions(layoutId: string) {
  const qc = useQueryClient();
  const refresh = () => qc.invalidateQueries({ queryKey: uploadsKey(layoutId) });
  const remove = useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/api/uploads/${encodeURIComponent(id)}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });
  const place = useMutation({
    mutationFn: ({ id, placement }: { id: string; placement: TracingPlacement | null }) =>
      placement
        ? apiFetch<UploadDto>(`/api/uploads/${encodeURIComponent(id)}/tracing`, { method: 'PUT', json: placement })
        : apiFetch<UploadDto>(`/api/uploads/${encodeURIComponent(id)}/tracing`, { method: 'DELETE' }),
    onSuccess: (dto) => {
      qc.setQueryData<UploadDto[]>(uploadsKey(layoutId), (list) => list?.map((u) => (u.id === dto.id ? dto : u)));
    },
  });
  return { remove, place, refresh };
}
