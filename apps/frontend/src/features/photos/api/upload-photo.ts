import { MAX_PHOTO_BYTES } from '@gaugeproof/api-types';
import { apiErrorOf, parseAnswer } from '@/lib/api-client';
import type { Photo } from '@/features/photos/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { megabytes } from '@/lib/contract-rules';

/** Same limits as the server (issue 4): JPEG, PNG or WebP, at most the contract's MAX_PHOTO_BYTES. */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const PHOTO_MAX_BYTES = MAX_PHOTO_BYTES;

/** A first check in the browser so a wrong file is refused before it is sent; the server checks the bytes. */
export function photoFileProblem(file: File): string | null {
  if (!(PHOTO_TYPES as readonly string[]).includes(file.type)) {
    return `${file.name} is not a JPEG, PNG or WebP image.`;
  }
  if (file.size > PHOTO_MAX_BYTES) {
    return `${file.name} is ${(file.size / 1024 / 1024).toFixed(1)} MB; photos may be at most ${megabytes(PHOTO_MAX_BYTES)}.`;
  }
  if (file.size === 0) return `${file.name} is empty.`;
  return null;
}

export interface UploadPhotoInput {
  file: File;
  sampleId?: number;
  caption?: string;
  /** Fraction sent, 0…1. */
  onProgress?: (fraction: number) => void;
}

/** Multipart upload with XMLHttpRequest, the one browser API that reports upload progress. */
export function uploadPhoto(lotId: number, input: UploadPhotoInput): Promise<Photo> {
  const form = new FormData();
  form.append('file', input.file);
  if (input.sampleId !== undefined) form.append('sampleId', String(input.sampleId));
  if (input.caption?.trim()) form.append('caption', input.caption.trim());
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/lots/${lotId}/photos`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) input.onProgress?.(event.loaded / event.total);
    };
    xhr.onload = () => {
      const body = parseAnswer(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        resolve(body as Photo);
        return;
      }
      reject(apiErrorOf(xhr.status, body, xhr.statusText || 'The upload failed.'));
    };
    xhr.onerror = () =>
      reject(new TypeError('The server cannot be reached. Check the connection.'));
    xhr.send(form);
  });
}

export function useUploadPhoto(lotId: number) {
  return useWriteMutation((input: UploadPhotoInput) => uploadPhoto(lotId, input), {
    refresh: [queryKeys.lots.detail(lotId)],
  });
}
