// Finds visible controls a gloved finger cannot hit: anything clickable under 44 x 44 CSS px.
//
// The size is WCAG 2.2 success criterion 2.5.5 "Target Size (Enhanced)" (44 x 44 CSS px), stricter than
// 2.5.8 "Target Size (Minimum)" (24 x 24). Both exempt an inline target: a link in a sentence, whose height
// is set by the line of text around it. So a link that sits inline among other words is left out; a link
// that stands alone (a list row, a chip, a menu item, a pager) must be 44 x 44. A checkbox or radio counts
// by its label, since the label takes the tap.
import type { Page } from "playwright-core";

export type SmallTarget = { what: string; width: number; height: number };

export const MIN_TARGET_PX = 44;

/** `within` limits the walk to one part of the page (an open dialog, whose page behind cannot be tapped). */
export async function smallTouchTargets(page: Page, within = "body", min = MIN_TARGET_PX): Promise<SmallTarget[]> {
  return page.evaluate(
    ([root, minPx]) => {
      const selector =
        "a[href], button, input:not([type=hidden]), select, textarea, summary, [role=button], [role=radio], [role=tab], [role=checkbox], [role=menuitem], [role=link], [tabindex]:not([tabindex='-1'])";
      const shown = (el: Element) => {
        const r = el.getBoundingClientRect();
        const s = getComputedStyle(el);
        // Screen-reader-only pieces (a skip link until it is focused) are 1 px and clipped: not a target on screen.
        return r.width > 2 && r.height > 2 && s.visibility !== "hidden" && s.display !== "none" && Number(s.opacity) > 0;
      };
      // Inline: the link flows in a line of words. Walk up through inline boxes to the block that holds the
      // line, and look for words in that line outside the link (reached only through inline boxes).
      const isInline = (n: Element) => getComputedStyle(n).display === "inline";
      const inlineInText = (el: Element) => {
        if (el.tagName !== "A" || !isInline(el)) return false;
        let block = el.parentElement;
        while (block && isInline(block)) block = block.parentElement;
        if (!block) return false;
        const words = (node: Node): number => {
          if (node === el) return 0;
          if (node.nodeType === Node.TEXT_NODE) return (node.textContent ?? "").trim().length;
          if (node instanceof Element && node !== block && !isInline(node)) return 0;
          return Array.from(node.childNodes).reduce((sum, c) => sum + words(c), 0);
        };
        return words(block) > 3;
      };
      const measured = (el: Element): Element => {
        if (el instanceof HTMLInputElement && (el.type === "checkbox" || el.type === "radio")) {
          return el.closest("label") ?? (el.id ? document.querySelector(`label[for="${CSS.escape(el.id)}"]`) : null) ?? el;
        }
        return el;
      };
      // A "stretched" link (an ::after laid over its card) is tapped anywhere on the card.
      const stretched = (el: Element): Element | null => {
        const after = getComputedStyle(el, "::after");
        if (after.content === "none" || after.position !== "absolute") return null;
        return (el as HTMLElement).offsetParent;
      };
      const name = (el: Element) => {
        const label = (el.getAttribute("aria-label") ?? el.textContent ?? (el as HTMLInputElement).name ?? "")
          .trim()
          .replace(/\s+/g, " ")
          .slice(0, 50);
        const id = el.id ? `#${el.id}` : "";
        const type = el instanceof HTMLInputElement ? `[type=${el.type}]` : "";
        return `${el.tagName.toLowerCase()}${id}${type} "${label}"`;
      };
      const out: { what: string; width: number; height: number }[] = [];
      const seen = new Set<Element>();
      for (const el of Array.from(document.querySelector(root)!.querySelectorAll(selector))) {
        if (!shown(el) || inlineInText(el)) continue;
        // A control inside a bigger control (an icon inside a button) is the bigger one's target.
        if (
          el.parentElement?.closest("a[href], button, label, summary") &&
          !(el instanceof HTMLInputElement || el instanceof HTMLSelectElement || el instanceof HTMLTextAreaElement)
        )
          continue;
        const target = stretched(el) ?? measured(el);
        if (seen.has(target)) continue;
        seen.add(target);
        const r = target.getBoundingClientRect();
        if (r.width + 0.5 < minPx || r.height + 0.5 < minPx)
          out.push({ what: name(el), width: Math.round(r.width), height: Math.round(r.height) });
      }
      return out;
    },
    [within, min] as const,
  );
}
