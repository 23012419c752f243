import { useMutation } from "@tanstack/react-query";
import { uploadWithProgress } from "@/lib/api-client";
import type { DatasetPreview } from "@waymark/contract";

/** Reads the first rows of a file and guesses its layout; nothing is stored. */
export function previewDataset(
  id: number,
  file: File,
  onProgress?: (f: number) => void,
): Promise<DatasetPreview> {
  const form = new FormData();
  form.append("file", file);
  return uploadWithProgress<DatasetPreview>(`/studies/${id}/datasets/preview`, form, onProgress);
}

export function usePreviewDataset(id: number, onProgress?: (f: number) => void) {
  return useMutation({ mutationFn: (file: File) => previewDataset(id, file, onProgress) });
}
