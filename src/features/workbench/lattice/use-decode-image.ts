import { useMutation } from '@tanstack/react-query';
import { upload } from '@/lib/api-client.ts';

/** A height image as the server decodes it (sharp reads TIFF, which the browser cannot). */
export interface DecodedImage {
  format: 'png' | 'tiff';
  width: number;
  height: number;
  bitDepth: 8 | 16 | 32;
  heights: number[][];
}

/** Sends a PNG or TIFF to POST /api/workbench/image-heights and answers its rows of numbers. */
export function useDecodeImage() {
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('image', file);
      return upload<DecodedImage>('/api/workbench/image-heights', form);
    },
  });
}
