// Signs a verdict the way the screen does: read what is signed, then send its hash with the password.
import { DEMO_PASSWORD } from "../../scripts/seed/demo-people";
import type { ApiClient } from "./api";

export type SignatureView = {
  meaning: string;
  contentHash: string;
  version: number;
  signature: null | { hash: string; currentHash: string; matches: boolean; meaning: string };
};

export async function signVerdict<T = { case: { id: string; version: number; status: string; signedContentHash: string } }>(
  client: ApiClient,
  id: string,
  opts: { password?: string; version?: number } = {},
) {
  const view = await client.json<SignatureView>("GET", `/api/cases/${id}/signature`);
  return client.json<T & { error?: string }>("POST", `/api/cases/${id}/signature`, {
    version: opts.version ?? view.body.version,
    password: opts.password ?? DEMO_PASSWORD,
    contentHash: view.body.contentHash,
    meaningAccepted: true,
  });
}
