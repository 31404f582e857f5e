"use client";
// The form's later sections, loaded right after the first screen is drawn. A plain import() from a
// client component splits their code out of the page's first load; next/dynamic would do the same but
// brings its own loader code into it, and this page's first load is kept small for phones.
import { useEffect, useState, type ComponentType } from "react";
import type { RemovalChecksProps } from "./removal-checks";

type Checks = ComponentType<RemovalChecksProps>;
let loaded: Checks | null = null;
const load = () => import("./removal-checks").then((m) => (loaded = m.RemovalChecks));

export function RemovalChecks(props: RemovalChecksProps) {
  // The server and the first client render both draw the placeholder; a later visit in the same tab has the code already.
  const [Loaded, setLoaded] = useState<Checks | null>(() => loaded);
  const [failed, setFailed] = useState(false);
  useEffect(() => {
    if (Loaded) return;
    load().then(
      (c) => setLoaded(() => c),
      () => setFailed(true),
    );
  }, [Loaded]);
  if (Loaded) return <Loaded {...props} />;
  if (failed) {
    return (
      <p role="alert" className="rounded-lg border border-danger/40 bg-danger-soft p-3 text-sm text-danger">
        The rest of this form could not be loaded. Reload the page once there is a connection; what you typed so far is kept.
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-5" aria-hidden="true" data-testid="checks-loading">
      {[180, 260, 320].map((h) => (
        <div key={h} style={{ height: h }} className="w-full animate-pulse rounded-xl border border-line bg-surface" />
      ))}
    </div>
  );
}
