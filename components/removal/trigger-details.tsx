"use client";
// The trigger and the detail it needs (detector reading and the owner's threshold, alarm level…).
import { TRIGGERS } from "@/lib/classification/triggers";
import { Field, Input, Select } from "@/components/ui/field";

type Detail = Record<string, string | number | boolean | null>;

export function TriggerDetails({
  trigger,
  detail,
  onTrigger,
  onDetail,
  errors,
}: {
  trigger: string;
  detail: Detail;
  onTrigger: (t: string) => void;
  onDetail: (d: Detail) => void;
  errors: Record<string, string>;
}) {
  const info = TRIGGERS.find((t) => t.code === trigger);
  return (
    <div className="flex flex-col gap-4">
      <Field label="What triggered the removal" htmlFor="trigger" error={errors.trigger}>
        <Select id="trigger" value={trigger} onChange={(e) => onTrigger(e.target.value)} aria-invalid={!!errors.trigger}>
          <option value="">Choose…</option>
          {TRIGGERS.map((t) => (
            <option key={t.code} value={t.code}>
              {t.label}
            </option>
          ))}
        </Select>
      </Field>
      {info ? <p className="-mt-2 text-sm text-muted">{info.description}</p> : null}
      {info?.fields.length ? (
        <div className="grid gap-3 sm:grid-cols-2">
          {info.fields.map((f) => {
            const id = `detail-${f.key}`;
            const v = detail[f.key];
            return (
              <Field
                key={f.key}
                label={`${f.label}${f.unit ? ` (${f.unit})` : ""}${f.required ? "" : " — optional"}`}
                htmlFor={id}
                hint={f.help}
                error={errors[`triggerDetail.${f.key}`]}
              >
                {f.kind === "choice" ? (
                  <Select id={id} value={String(v ?? "")} onChange={(e) => onDetail({ ...detail, [f.key]: e.target.value || null })}>
                    <option value="">—</option>
                    {f.options?.map((o) => (
                      <option key={o.code} value={o.code}>
                        {o.label}
                      </option>
                    ))}
                  </Select>
                ) : (
                  <Input
                    id={id}
                    inputMode={f.kind === "number" ? "decimal" : "text"}
                    value={v === null || v === undefined ? "" : String(v)}
                    onChange={(e) => {
                      const raw = e.target.value;
                      const num = Number(raw.replace(",", "."));
                      onDetail({ ...detail, [f.key]: raw === "" ? null : f.kind === "number" && Number.isFinite(num) ? num : raw });
                    }}
                  />
                )}
              </Field>
            );
          })}
        </div>
      ) : null}
      {trigger === "wayside-hot" ? (
        <p className="rounded-md bg-surface-2 px-3 py-2 text-xs text-muted">
          Tearline records the reading and the owner&apos;s threshold as given; it applies no threshold of its own.
        </p>
      ) : null}
    </div>
  );
}
