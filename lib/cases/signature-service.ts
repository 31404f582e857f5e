// The signature ceremony: the signer sees exactly what is signed, confirms what the signature
// means, and gives their password again. The second-signer and stage rules are the workflow's own.
import "server-only";
import { verifyPassword } from "better-auth/crypto";
import { z } from "@/lib/validation/zod";
import { passwordHashOf, signedParts } from "@/db/queries/signature";
import { addFailure, clearCounter, readCounters } from "@/db/queries/sign-in-failures";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import { HttpError, badRequest, conflict } from "@/lib/http/errors";
import { minutesLeft } from "@/lib/security/sign-in-rules";
import { stepReplay, writeStep } from "./step-write";
import { SIGNATURE_MEANING, contentHash, type SignedContent } from "./signature-content";
import { checkTransition } from "./workflow";

// Wrong passwords at the signature: a few slips are forgiven, then the signer waits.
const SLIPS = 5;
const WINDOW_SECONDS = 15 * 60;
const LOCK_MINUTES = 15;
const slipKey = (userId: string) => `signature:${userId}`;

export const signSchema = z.object({
  version: z.number().int().positive("Send the version of the case you are looking at."),
  password: z.string().min(1, "Enter your password to sign.").max(200, "That password is too long."),
  contentHash: z.string().regex(/^[0-9a-f]{64}$/, "Send the hash of the content you were shown."),
  meaningAccepted: z.literal(true, { message: "Tick the box to confirm what your signature means." }),
});

export async function contentOf(c: Case): Promise<SignedContent> {
  const parts = await signedParts(c.id);
  return {
    caseNumber: c.number,
    verdict: {
      primaryCause: c.primaryCause,
      contributingCauses: c.contributingCauses,
      confidence: c.confidence,
      removalConfirmed: c.removalConfirmed,
      correctiveAction: c.correctiveAction,
      verdictNotes: c.verdictNotes,
    },
    ...parts,
  };
}

export type SignatureCheck = {
  signedBy: string | null;
  signedAt: Date | null;
  meaning: string | null;
  hash: string;
  currentHash: string;
  matches: boolean;
};

/** For a signed case: does it still hold exactly what was signed? */
export async function checkSignature(c: Case): Promise<SignatureCheck | null> {
  if (c.status !== "signed" || !c.signedContentHash) return null;
  const currentHash = contentHash(await contentOf(c));
  return {
    signedBy: c.signedBy,
    signedAt: c.signedAt,
    meaning: c.signedMeaning,
    hash: c.signedContentHash,
    currentHash,
    matches: currentHash === c.signedContentHash,
  };
}

export async function signCase(c: Case, body: unknown, user: CurrentUser): Promise<Case> {
  const input = signSchema.parse(body);
  // A doubled or retried signature (same version, same signer) answers with the one already made.
  const done = await stepReplay(c, input.version, "sign", user);
  if (done) return done;
  const check = checkTransition(
    "sign",
    c.status,
    user.role,
    undefined,
    { primaryCause: c.primaryCause, confidence: c.confidence, removalConfirmed: c.removalConfirmed, findingCount: 0 },
    { actorId: user.id, proposedBy: c.proposedBy },
  );
  if (!check.ok)
    throw check.status === 400
      ? badRequest(check.message)
      : new HttpError(check.status, check.status === 403 ? "forbidden" : "conflict", check.message);
  if (c.version !== input.version) throw conflict("The case changed since you opened it; reload to see what you are signing.");

  const key_ = slipKey(user.id);
  const counter = (await readCounters([key_])).get(key_);
  const now = new Date();
  if (counter?.lockedUntil && counter.lockedUntil > now) {
    throw new HttpError(429, "locked", `Too many wrong passwords. Try again in ${minutesLeft(counter.lockedUntil, now)} minutes.`);
  }
  const hash = await passwordHashOf(user.id);
  if (!hash || !(await verifyPassword({ hash, password: input.password }))) {
    await addFailure(key_, WINDOW_SECONDS, SLIPS, LOCK_MINUTES);
    throw new HttpError(403, "wrong-password", "That password is not right. The verdict was not signed.");
  }
  await clearCounter(key_);

  const signedHash = contentHash(await contentOf(c));
  if (signedHash !== input.contentHash) throw conflict("The case changed while you were reading it; reload and look again before signing.");
  return writeStep(
    c,
    input.version,
    "sign",
    { status: check.to, signedAt: now, signedBy: user.id, signedMeaning: SIGNATURE_MEANING, signedContentHash: signedHash },
    user,
  );
}
