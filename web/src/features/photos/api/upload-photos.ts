import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError, parseErrorBody, unwrapData } from '@/lib/api-client';
import { photoKeys } from './keys';
import type { PhotoView } from './types';

export interface UploadPhotosInput {
  files: readonly File[];
  /** The athlete's local date (YYYY-MM-DD). */
  date: string;
  pose: string;
}

/** Share of the request body sent so far, 0–1. */
export type UploadProgress = (fraction: number) => void;

function parseJson(text: string): unknown {
  try {
    return text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    return undefined;
  }
}

/**
 * POST /api/athletes/:athleteId/photos as multipart/form-data (`files`, `date`, `pose`). Sent with
 * XMLHttpRequest rather than fetch because only XHR reports upload progress; the session cookie
 * goes along (same origin) and errors become the same ApiError as every other call.
 */
export function uploadPhotos(
  athleteId: string,
  input: UploadPhotosInput,
  onProgress?: UploadProgress,
): Promise<PhotoView[]> {
  const body = new FormData();
  body.set('date', input.date);
  body.set('pose', input.pose);
  for (const file of input.files) body.append('files', file, file.name);

  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/athletes/${encodeURIComponent(athleteId)}/photos`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    };
    xhr.onload = () => {
      const parsed = parseJson(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) resolve(unwrapData<PhotoView[]>(parsed));
      else reject(parseErrorBody(xhr.status, parsed));
    };
    xhr.onerror = () =>
      reject(
        new ApiError({
          status: 0,
          code: 'network_error',
          message: 'The photos could not be sent. Check your connection and try again.',
        }),
      );
    xhr.send(body);
  });
}

export function useUploadPhotos(
  athleteId: string,
  options: { onProgress?: UploadProgress; onSuccess?: (photos: PhotoView[]) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadPhotosInput) => uploadPhotos(athleteId, input, options.onProgress),
    onSuccess: async (photos) => {
      await queryClient.invalidateQueries({ queryKey: photoKeys.athlete(athleteId) });
      options.onSuccess?.(photos);
    },
  });
}
