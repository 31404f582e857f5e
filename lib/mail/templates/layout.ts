// Tearline's e-mail look: one narrow card, the slate-and-amber palette of the app, a plain-text twin.
export type RenderedMail = { subject: string; html: string; text: string };

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

type Block = { kind: "p"; text: string } | { kind: "button"; label: string; url: string } | { kind: "facts"; rows: [string, string][] };

export function renderMail(subject: string, heading: string, blocks: Block[], footer?: string): RenderedMail {
  const htmlBlocks = blocks
    .map((b) => {
      if (b.kind === "p") return `<p style="margin:0 0 14px;line-height:1.5">${escapeHtml(b.text)}</p>`;
      if (b.kind === "button")
        return `<p style="margin:20px 0"><a href="${escapeHtml(b.url)}" style="background:#b45309;color:#fff;padding:11px 18px;border-radius:6px;text-decoration:none;font-weight:600">${escapeHtml(b.label)}</a></p><p style="margin:0 0 14px;font-size:12px;color:#64748b">Or paste this address into your browser: ${escapeHtml(b.url)}</p>`;
      return `<table style="border-collapse:collapse;margin:0 0 14px;font-size:14px">${b.rows
        .map(
          ([k, v]) =>
            `<tr><td style="padding:3px 14px 3px 0;color:#64748b">${escapeHtml(k)}</td><td style="padding:3px 0">${escapeHtml(v)}</td></tr>`,
        )
        .join("")}</table>`;
    })
    .join("\n");
  const foot = footer ?? "You receive this because you have an account on Tearline. Notice settings are on your profile page.";
  const html = `<!doctype html><html><body style="margin:0;background:#f1f5f9;font-family:Inter,Segoe UI,Helvetica,Arial,sans-serif;color:#0f172a">
<div style="max-width:560px;margin:24px auto;background:#fff;border-radius:10px;border:1px solid #e2e8f0;overflow:hidden">
<div style="background:#0f172a;color:#fbbf24;padding:14px 24px;font-weight:700;letter-spacing:.04em">TEARLINE</div>
<div style="padding:24px"><h1 style="font-size:19px;margin:0 0 16px">${escapeHtml(heading)}</h1>
${htmlBlocks}</div>
<div style="padding:14px 24px;border-top:1px solid #e2e8f0;font-size:12px;color:#64748b">${escapeHtml(foot)}</div></div></body></html>`;
  const text = [
    heading,
    "",
    ...blocks.map((b) =>
      b.kind === "p" ? b.text : b.kind === "button" ? `${b.label}: ${b.url}` : b.rows.map(([k, v]) => `${k}: ${v}`).join("\n"),
    ),
    "",
    "--",
    foot,
  ]
    .join("\n\n")
    .replace(/\n{3,}/g, "\n\n");
  return { subject, html, text };
}
