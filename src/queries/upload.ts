"use client";

import { ApiError } from "./api";

/**
 * Sends one file as multipart/form-data (field `file`) with upload progress.
 * XMLHttpRequest rather than fetch because only it reports upload progress;
 * `onProgress` receives a share 0..1 while sending and null once the server
 * is working on the file.
 */
export function uploadFile<T>(
  url: string,
  file: File,
  onProgress: (share: number | null) => void,
  signal?: AbortSignal,
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.responseType = "text";
    xhr.setRequestHeader("accept", "application/json");
    xhr.upload.onprogress = (e) => onProgress(e.lengthComputable ? e.loaded / e.total : null);
    xhr.upload.onload = () => onProgress(null);
    xhr.onerror = () => reject(new ApiError(0, "network", "The upload did not reach the server."));
    xhr.onabort = () => reject(new ApiError(0, "aborted", "The upload was cancelled."));
    signal?.addEventListener("abort", () => xhr.abort());
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : null;
      } catch {
        body = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(body as T);
      const err = (
        body as {
          error?: { code?: string; message?: string; issues?: { path: string; message: string }[]; current?: unknown };
        } | null
      )?.error;
      const fallback = xhr.status === 413 ? "The file is too large." : `The server answered ${xhr.status}.`;
      reject(
        new ApiError(
          xhr.status,
          err?.code ?? `http-${xhr.status}`,
          err?.message ?? fallback,
          err?.issues ?? [],
          err?.current,
        ),
      );
    };
    const form = new FormData();
    form.append("file", file);
    xhr.send(form);
  });
}
