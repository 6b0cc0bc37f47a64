import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { PHOTO_FIELD, type PhotoFieldsInput, type PhotoView } from '@shared/schemas/photo';
import { photoKeys } from './photo-keys';
import { uploadImage } from './upload-image';

export interface PhotoUploadInput {
  file: File;
  fields: PhotoFieldsInput;
}

export const uploadPhoto = (clientId: number, { file, fields }: PhotoUploadInput, onProgress?: (fraction: number) => void) => {
  const form = new FormData();
  form.append('kind', fields.kind);
  form.append('takenOn', fields.takenOn);
  if (fields.measurementSetId !== undefined && fields.measurementSetId !== '') form.append('measurementSetId', String(fields.measurementSetId));
  form.append(PHOTO_FIELD, file, file.name);
  return uploadImage<PhotoView>(`/clients/${clientId}/photos`, 'POST', form, onProgress);
};

/** Uploads a fitting photo; `progress` is the fraction sent (null when idle). */
export function useUploadPhoto(clientId: number, { onSuccess }: { onSuccess?: (photo: PhotoView) => void } = {}) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const mutation = useMutation({
    mutationFn: (input: PhotoUploadInput) => {
      setProgress(0);
      return uploadPhoto(clientId, input, setProgress);
    },
    onSettled: () => setProgress(null),
    onSuccess: async (photo) => {
      await queryClient.invalidateQueries({ queryKey: photoKeys.list(clientId) });
      onSuccess?.(photo);
    },
  });
  return { ...mutation, progress };
}
