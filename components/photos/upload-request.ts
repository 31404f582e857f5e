// One upload over XMLHttpRequest, because fetch cannot report upload progress.
import type { PhotoView } from "@/lib/photos/view";

export type UploadAnswer =
  | { ok: true; photo: PhotoView; duplicate: boolean; message: string }
  | { ok: false; status: number; message: string };

export function sendPhoto(url: string, form: FormData, onProgress: (fraction: number) => void, signal?: AbortSignal): Promise<UploadAnswer> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      const body = (xhr.response ?? {}) as { photo?: PhotoView; duplicate?: boolean; message?: string; error?: string };
      if (xhr.status >= 200 && xhr.status < 300 && body.photo) {
        resolve({ ok: true, photo: body.photo, duplicate: Boolean(body.duplicate), message: body.message ?? "" });
      } else {
        resolve({ ok: false, status: xhr.status, message: body.error ?? `The server answered ${xhr.status}; try again.` });
      }
    };
    xhr.onerror = () => resolve({ ok: false, status: 0, message: "The connection dropped during the upload. Check the network and retry." });
    xhr.onabort = () => resolve({ ok: false, status: 0, message: "Upload cancelled." });
    signal?.addEventListener("abort", () => xhr.abort());
    xhr.send(form);
  });
}

export async function patchPhoto(id: string, tags: Record<string, unknown>): Promise<{ ok: true; photo: PhotoView } | { ok: false; message: string }> {
  const res = await fetch(`/api/photos/${id}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(tags) });
  const body = (await res.json().catch(() => ({}))) as { photo?: PhotoView; error?: string };
  return res.ok && body.photo ? { ok: true, photo: body.photo } : { ok: false, message: body.error ?? `Could not save the tags (${res.status}).` };
}

export async function deletePhoto(id: string): Promise<{ ok: boolean; message: string }> {
  const res = await fetch(`/api/photos/${id}`, { method: "DELETE" });
  const body = (await res.json().catch(() => ({}))) as { message?: string; error?: string };
  return { ok: res.ok, message: body.message ?? body.error ?? `The server answered ${res.status}.` };
}
