import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { PHOTO_FIELD, type SwatchView } from '@shared/schemas/photo';
import { api } from '@/lib/api-client';
import { swatchKeys } from './photo-keys';
import { uploadImage } from './upload-image';

export const putSwatch = (fabricId: number, file: File, onProgress?: (fraction: number) => void) => {
  const form = new FormData();
  form.append(PHOTO_FIELD, file, file.name);
  return uploadImage<SwatchView>(`/fabrics/${fabricId}/swatch`, 'PUT', form, onProgress);
};

export const deleteSwatch = (fabricId: number) => api<void>(`/fabrics/${fabricId}/swatch`, { method: 'DELETE' });

/** Sets or replaces a fabric's swatch; `progress` is the fraction sent (null when idle). */
export function usePutSwatch(fabricId: number) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const mutation = useMutation({
    mutationFn: (file: File) => {
      setProgress(0);
      return putSwatch(fabricId, file, setProgress);
    },
    onSettled: () => setProgress(null),
    onSuccess: async (swatch) => {
      queryClient.setQueryData(swatchKeys.detail(fabricId), { swatch });
      await queryClient.invalidateQueries({ queryKey: swatchKeys.list() });
    },
  });
  return { ...mutation, progress };
}

export function useDeleteSwatch(fabricId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteSwatch(fabricId),
    onSuccess: async () => {
      queryClient.setQueryData(swatchKeys.detail(fabricId), { swatch: null });
      await queryClient.invalidateQueries({ queryKey: swatchKeys.list() });
    },
  });
}
