// One upload over XMLHttpRequest, because fetch cannot report upload progress; its refusals are
// read like every other API answer (lib/client/api-problem.ts).
import { callApi, problemFrom, TIMEOUT_MESSAGE, UPLOAD_TIMEOUT_MS } from "@/lib/client/api";
import type { PhotoView } from "@/lib/photos/view";

export type UploadAnswer =
  | { ok: true; photo: PhotoView; duplicate: boolean; message: string }
  | { ok: false; status: number; message: string };

export function sendPhoto(
  url: string,
  form: FormData,
  onProgress: (fraction: number) => void,
  signal?: AbortSignal,
): Promise<UploadAnswer> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.responseType = "json";
    xhr.timeout = UPLOAD_TIMEOUT_MS;
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      const body = (xhr.response ?? {}) as { photo?: PhotoView; duplicate?: boolean; message?: string };
      if (xhr.status >= 200 && xhr.status < 300 && body.photo) {
        resolve({ ok: true, photo: body.photo, duplicate: Boolean(body.duplicate), message: body.message ?? "" });
      } else {
        resolve({
          ok: false,
          status: xhr.status,
          message: problemFrom(xhr.status, xhr.response, { fallback: `The server answered ${xhr.status}; try again.` }).message,
        });
      }
    };
    xhr.ontimeout = () => resolve({ ok: false, status: 0, message: TIMEOUT_MESSAGE });
    xhr.onerror = () =>
      resolve({ ok: false, status: 0, message: "The connection dropped during the upload. Check the network and retry." });
    xhr.onabort = () => resolve({ ok: false, status: 0, message: "Upload cancelled." });
    signal?.addEventListener("abort", () => xhr.abort());
    xhr.send(form);
  });
}

export async function patchPhoto(
  id: string,
  tags: Record<string, unknown>,
): Promise<{ ok: true; photo: PhotoView } | { ok: false; message: string }> {
  const res = await callApi<{ photo?: PhotoView }>("PATCH", `/api/photos/${id}`, { json: tags, fallback: "Could not save the tags." });
  if (!res.ok) return { ok: false, message: res.message };
  return res.data?.photo ? { ok: true, photo: res.data.photo } : { ok: false, message: "Could not save the tags." };
}

export async function deletePhoto(id: string): Promise<{ ok: boolean; message: string }> {
  const res = await callApi<{ message?: string }>("DELETE", `/api/photos/${id}`);
  return res.ok ? { ok: true, message: res.data?.message ?? "" } : { ok: false, message: res.message };
}
