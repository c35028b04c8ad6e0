import { useMutation, useQueryClient } from '@tanstack/react-query';
import { photoKeys } from './photo-queries';
import { uploadPhoto } from './upload-photo';

export function useUploadPhoto(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadPhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKeys.visit(visitId) }),
  });
}
