import { formatIn, formatMmFromIn } from "@/lib/admin/policy-units";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field/end-play-policy";

/** Why the limit is what it is, and whose rules it answers to. */
export function PolicyNotes() {
  const max = DEFAULT_END_PLAY_POLICY.maxIn;
  return (
    <aside
      className="rounded-xl border border-line bg-surface p-4 text-sm leading-relaxed text-ink-2 sm:p-5"
      aria-labelledby="policy-notes-title"
    >
      <h2 id="policy-notes-title" className="font-semibold text-ink">
        How the limits are used
      </h2>
      <p className="mt-2">
        Tearline starts every site at the common interchange practice: mounted end play of more than{" "}
        <strong className="text-ink">
          1/16 in ({formatIn(max)} in, {formatMmFromIn(max)} mm)
        </strong>{" "}
        removes the bearing.
      </p>
      <p className="mt-2">
        A site&apos;s own limit applies to every case removed there: the field call and its reasons are judged against it. Cases already
        filed keep the call they were saved with until their field report is next edited.
      </p>
      <p className="mt-2">
        The trial spreads say how closely repeated readings should agree before Tearline asks for a re-check: about two divisions of a 0.001
        in dial, or one 1/64 in tape graduation.
      </p>
      <p className="mt-3 rounded-lg bg-warn-soft px-3 py-2 text-xs text-ink-2">
        Set these from your employer&apos;s procedures and the interchange rules that apply to your cars. Tearline records and applies the
        limit you enter; it does not decide it.
      </p>
    </aside>
  );
}
