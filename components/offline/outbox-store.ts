// The device outbox: filed reports kept in IndexedDB until the server has them.
// Each entry carries the Idempotency-Key it is sent with, so a replay never files twice.

export type OutboxEntry = {
  key: string;
  /** The field report as POST /api/cases takes it. */
  body: unknown;
  /** For the outbox list: car and position, as the person would recognise the report. */
  label: string;
  queuedAt: string;
  attempts: number;
  state: "waiting" | "sending" | "refused";
  error?: string;
};

const DB = "tearline-device";
const STORE = "outbox";

function open(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const req = indexedDB.open(DB, 1);
    req.onupgradeneeded = () => req.result.createObjectStore(STORE, { keyPath: "key" });
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
  });
}

async function run<T>(mode: IDBTransactionMode, fn: (s: IDBObjectStore) => IDBRequest<T>): Promise<T> {
  const db = await open();
  try {
    return await new Promise<T>((resolve, reject) => {
      const tx = db.transaction(STORE, mode);
      const req = fn(tx.objectStore(STORE));
      tx.oncomplete = () => resolve(req.result);
      tx.onerror = () => reject(tx.error);
    });
  } finally {
    db.close();
  }
}

export const putEntry = (e: OutboxEntry) => run("readwrite", (s) => s.put(e)).then(() => undefined);
export const deleteEntry = (key: string) => run("readwrite", (s) => s.delete(key)).then(() => undefined);
export const listEntries = async () =>
  ((await run("readonly", (s) => s.getAll())) as OutboxEntry[]).sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));

/** Tells every open page (and tab) that the outbox changed. */
export function announce(detail: { sent?: { key: string; number: string } } = {}) {
  window.dispatchEvent(new CustomEvent("tearline:outbox", { detail }));
  try {
    new BroadcastChannel("tearline-outbox").postMessage(detail);
  } catch {
    /* older browsers: this tab alone */
  }
}
