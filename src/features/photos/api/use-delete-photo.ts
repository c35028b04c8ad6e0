import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { attachmentsPath, photoKeys } from './photo-queries';

export function useDeletePhoto(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => apiRequest<void>(`${attachmentsPath(visitId)}/${photoId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKeys.visit(visitId) }),
  });
}
