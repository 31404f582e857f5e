"use client";
// The upload queue: two files at a time, each with its own progress, status, retry and tags.
import { useCallback, useEffect, useRef, useState } from "react";
import type { PhotoView } from "@/lib/photos/view";
import { appendTags, tagsForApi, type TagValues } from "./tag-values";
import { patchPhoto, sendPhoto } from "./upload-request";

const AT_ONCE = 2;

export type QueueStatus = "waiting" | "uploading" | "done" | "duplicate" | "failed";

export type QueueItem = {
  key: string;
  file: File;
  preview: string | null;
  status: QueueStatus;
  progress: number;
  message: string;
  tags: TagValues;
  photo?: PhotoView;
  /** Tags edited while the file was on its way: saved once it has arrived. */
  tagsChangedInFlight?: boolean;
};

let counter = 0;
const browserCanShow = (f: File) => /^image\/(jpeg|png|webp|gif|avif)$/.test(f.type);

export function useUploadQueue(url: string, onStored: (photo: PhotoView) => void) {
  const [items, setItems] = useState<QueueItem[]>([]);
  const itemsRef = useRef(items);
  itemsRef.current = items;
  const started = useRef(new Set<string>());
  const aborts = useRef(new Map<string, AbortController>());

  const update = useCallback((key: string, patch: Partial<QueueItem>) => {
    setItems((list) => list.map((i) => (i.key === key ? { ...i, ...patch } : i)));
  }, []);

  const run = useCallback(
    async (item: QueueItem) => {
      const form = new FormData();
      form.set("file", item.file, item.file.name);
      appendTags(form, item.tags);
      const abort = new AbortController();
      aborts.current.set(item.key, abort);
      update(item.key, { status: "uploading", progress: 0, message: "" });
      const answer = await sendPhoto(url, form, (progress) => update(item.key, { progress }), abort.signal);
      aborts.current.delete(item.key);
      started.current.delete(item.key);
      if (!answer.ok) return update(item.key, { status: "failed", message: answer.message });
      const latest = itemsRef.current.find((i) => i.key === item.key);
      let photo = answer.photo;
      if (latest?.tagsChangedInFlight && !answer.duplicate) {
        const saved = await patchPhoto(photo.id, tagsForApi(latest.tags));
        if (saved.ok) photo = saved.photo;
      }
      update(item.key, {
        status: answer.duplicate ? "duplicate" : "done",
        progress: 1,
        message: answer.message,
        photo,
        tagsChangedInFlight: false,
      });
      onStored(photo);
    },
    [onStored, update, url],
  );

  useEffect(() => {
    const busy = items.filter((i) => i.status === "uploading").length;
    const next = items.filter((i) => i.status === "waiting" && !started.current.has(i.key)).slice(0, Math.max(0, AT_ONCE - busy));
    for (const item of next) {
      started.current.add(item.key);
      void run(item);
    }
  }, [items, run]);

  useEffect(
    () => () => {
      for (const a of aborts.current.values()) a.abort();
      for (const i of itemsRef.current) if (i.preview) URL.revokeObjectURL(i.preview);
    },
    [],
  );

  const add = useCallback((files: File[], tags: TagValues) => {
    const fresh = files.map<QueueItem>((file) => ({
      key: `u${++counter}`,
      file,
      preview: browserCanShow(file) ? URL.createObjectURL(file) : null,
      status: "waiting",
      progress: 0,
      message: "",
      tags: { ...tags },
    }));
    setItems((list) => [...list, ...fresh]);
  }, []);

  /** A file refused before it was sent (wrong type picked in the browser). */
  const reject = useCallback((file: File, message: string) => {
    setItems((list) => [
      ...list,
      {
        key: `u${++counter}`,
        file,
        preview: null,
        status: "failed",
        progress: 0,
        message,
        tags: { component: "", row: "", clockDeg: "", findingId: "", caption: "" },
      },
    ]);
  }, []);

  const retry = useCallback((key: string) => update(key, { status: "waiting", progress: 0, message: "" }), [update]);

  const remove = useCallback((key: string) => {
    aborts.current.get(key)?.abort();
    setItems((list) => {
      const gone = list.find((i) => i.key === key);
      if (gone?.preview) URL.revokeObjectURL(gone.preview);
      return list.filter((i) => i.key !== key);
    });
  }, []);

  const setTags = useCallback(
    async (key: string, tags: TagValues): Promise<string | null> => {
      const item = itemsRef.current.find((i) => i.key === key);
      if (!item) return null;
      if (item.photo && (item.status === "done" || item.status === "duplicate")) {
        const saved = await patchPhoto(item.photo.id, tagsForApi(tags));
        if (!saved.ok) return saved.message;
        update(key, { tags, photo: saved.photo });
        onStored(saved.photo);
        return null;
      }
      update(key, { tags, tagsChangedInFlight: item.status === "uploading" });
      return null;
    },
    [onStored, update],
  );

  const clearFinished = useCallback(() => {
    setItems((list) => {
      for (const i of list) if ((i.status === "done" || i.status === "duplicate") && i.preview) URL.revokeObjectURL(i.preview);
      return list.filter((i) => i.status !== "done" && i.status !== "duplicate");
    });
  }, []);

  return { items, add, reject, retry, remove, setTags, clearFinished };
}
