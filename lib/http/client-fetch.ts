// Browser requests with a time limit: a steel shop's weak signal must end in a message, never a spinner forever.

/** Long enough for a photo over a slow link; short enough that a person is not left waiting without word. */
export const CLIENT_TIMEOUT_MS = 20_000;

export const TIMEOUT_MESSAGE = "The server did not answer in time. Check the connection and try again; nothing was lost on this screen.";
export const OFFLINE_MESSAGE = "The server could not be reached. Check the connection and try again.";

/** Like fetch, but gives up after `ms`; a failure resolves to a readable message instead of throwing. */
export async function fetchWithTimeout(url: string, init: RequestInit = {}, ms = CLIENT_TIMEOUT_MS): Promise<{ res: Response } | { res: null; message: string }> {
  try {
    const signal = init.signal ? AbortSignal.any([init.signal, AbortSignal.timeout(ms)]) : AbortSignal.timeout(ms);
    return { res: await fetch(url, { ...init, signal }) };
  } catch (e) {
    const name = (e as Error)?.name;
    return { res: null, message: name === "TimeoutError" ? TIMEOUT_MESSAGE : OFFLINE_MESSAGE };
  }
}
