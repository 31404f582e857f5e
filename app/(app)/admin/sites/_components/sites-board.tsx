"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { SiteCard } from "./site-card";
import { SiteForm } from "./site-form";
import type { SiteView } from "./types";

export function SitesBoard({ sites }: { sites: SiteView[] }) {
  const [adding, setAdding] = useState(false);
  const active = sites.filter((s) => s.active).length;
  return (
    <div className="flex flex-col gap-4">
      <div className="flex items-center justify-between gap-3">
        <p className="text-sm text-muted">
          {active} active{sites.length > active ? `, ${sites.length - active} inactive` : ""}
        </p>
        {!adding ? <Button onClick={() => setAdding(true)}>Add a site</Button> : null}
      </div>
      {adding ? (
        <Card title="New site">
          <SiteForm onDone={() => setAdding(false)} />
        </Card>
      ) : null}
      {sites.length ? (
        <ul className="flex flex-col gap-3">
          {sites.map((s) => (
            <SiteCard key={s.id} site={s} />
          ))}
        </ul>
      ) : (
        <EmptyState title="No sites yet">Add the car shops, wheel shops and labs that remove or tear down bearings.</EmptyState>
      )}
    </div>
  );
}
