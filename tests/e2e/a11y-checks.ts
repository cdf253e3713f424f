// Accessibility checks run inside a page, shared by the route audit and the keyboard tests. Each
// returns a list of problems (empty = pass) naming the element, so a failure says what to fix.
// References: W3C WCAG 2.2 (Recommendation, 12 Dec 2024) — 1.4.10 Reflow, 1.4.12 Text Spacing,
// 2.4.7 Focus Visible, 2.4.11 Focus Not Obscured (Minimum), 2.5.8 Target Size (Minimum), 1.4.1 Use
// of Colour, 2.3.3 Animation from Interactions; the Understanding documents for each.
import AxeBuilder from "@axe-core/playwright";
import type { Page } from "@playwright/test";

export const WCAG22_AA = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"];

export async function axeProblems(page: Page, label: string): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(WCAG22_AA).analyze();
  return results.violations.map((v) => `${label}: axe ${v.id} (${v.nodes.length}) ${v.nodes[0]?.target} ${v.nodes[0]?.failureSummary?.split("\n")[1]?.trim() ?? ""}`);
}


/**
 * WCAG 1.4.10: at 320 CSS px the page itself never scrolls sideways; anything that does scroll
 * sideways is a labelled, keyboard-reachable region (role=region, aria-label, tabindex=0).
 */
export async function reflowProblems(page: Page, label: string): Promise<string[]> {
  return page.evaluate(
    (label) => {
      const name = (el: Element) => `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""} “${(el.getAttribute("aria-label") || el.textContent || "").trim().replace(/\s+/g, " ").slice(0, 40)}”`;
      const out: string[] = [];
      const doc = document.documentElement;
      if (doc.scrollWidth > doc.clientWidth + 1) {
        // name the outermost boxes that stick out (not inside a scroll region of their own)
        const wide = [...document.querySelectorAll<HTMLElement>("body *")].filter((el) => el.getBoundingClientRect().right > doc.clientWidth + 1 && !el.parentElement?.closest("[role=region]"));
        const outer = wide.filter((el) => !wide.includes(el.parentElement as HTMLElement));
        out.push(`${label}: the page scrolls sideways (${doc.scrollWidth} > ${doc.clientWidth}): ${outer.slice(0, 3).map(name).join(", ")}`);
      }
      for (const el of document.querySelectorAll<HTMLElement>("body *")) {
        const cs = getComputedStyle(el);
        if (!["auto", "scroll"].includes(cs.overflowX) || el.scrollWidth <= el.clientWidth + 1 || el.clientWidth === 0) continue;
        if (el.tagName === "TEXTAREA" || el.tagName === "PRE") continue; // their own scroll, reachable by keyboard as text
        const ok = el.getAttribute("role") === "region" && Boolean(el.getAttribute("aria-label")) && el.tabIndex === 0;
        if (!ok) out.push(`${label}: ${name(el)} scrolls sideways without role=region, aria-label and tabindex=0`);
      }
      return out;
    },
    label,
  );
}

/**
 * WCAG 1.4.12: with the criterion's spacing applied to every element (line height 1.5, space after
 * paragraphs 2, letter spacing 0.12 and word spacing 0.16 times the font size; set through the
 * CSSOM, as a user style sheet would, so a content security policy does not stand in the way)
 * nothing is cut off: no element that hides its overflow (overflow hidden/clip, or a text-overflow
 * ellipsis) holds more text than it shows, and the page still does not scroll sideways.
 * Visually-hidden text (1 px clip) is left out. Run it last on a page: the spacing stays.
 */
export async function textSpacingProblems(page: Page, label: string): Promise<string[]> {
  return page.evaluate(async (label) => {
    const name = (el: Element) => `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""} “${(el.getAttribute("aria-label") || el.textContent || "").trim().replace(/\s+/g, " ").slice(0, 40)}”`;
    for (const el of document.querySelectorAll<HTMLElement>("body, body *")) {
      el.style.setProperty("line-height", "1.5", "important");
      el.style.setProperty("letter-spacing", "0.12em", "important");
      el.style.setProperty("word-spacing", "0.16em", "important");
      if (el.tagName === "P") el.style.setProperty("margin-bottom", "2em", "important");
    }
    await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
    const out: string[] = [];
    const doc = document.documentElement;
    if (doc.scrollWidth > doc.clientWidth + 1) {
      const wide = [...document.querySelectorAll<HTMLElement>("body *")].filter((el) => el.getBoundingClientRect().right > doc.clientWidth + 1 && !el.parentElement?.closest("[role=region]"));
      const outer = wide.filter((el) => !wide.includes(el.parentElement as HTMLElement));
      out.push(`${label}: with text spacing the page scrolls sideways (${doc.scrollWidth} > ${doc.clientWidth}): ${outer.slice(0, 3).map(name).join(", ")}`);
    }
    for (const el of document.querySelectorAll<HTMLElement>("body *")) {
      if (!el.textContent?.trim() || el.clientWidth <= 1 || el.clientHeight <= 1) continue;
      if (el.closest("svg, [aria-hidden='true']")) continue;
      const cs = getComputedStyle(el);
      const hidesX = ["hidden", "clip"].includes(cs.overflowX) || cs.textOverflow === "ellipsis";
      const hidesY = ["hidden", "clip"].includes(cs.overflowY);
      if ((hidesX && el.scrollWidth > el.clientWidth + 1) || (hidesY && el.scrollHeight > el.clientHeight + 1)) {
        out.push(`${label}: with text spacing ${name(el)} cuts off its text (${el.scrollWidth}×${el.scrollHeight} in ${el.clientWidth}×${el.clientHeight})`);
      }
    }
    return out;
  }, label);
}

/**
 * WCAG 2.5.8 (AA): every pointer target is at least 24 × 24 CSS px, or one of the criterion's
 * exceptions holds: a link inside a sentence (inline), or spacing (a 24 px circle centred on the
 * target meets no other target). A checkbox or radio counts with its label, which takes the click.
 */
export async function targetSizeProblems(page: Page, label: string): Promise<string[]> {
  return page.evaluate(
    (label) => {
      const name = (el: Element) => `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""} “${(el.getAttribute("aria-label") || el.textContent || "").trim().replace(/\s+/g, " ").slice(0, 40)}”`;
      const sel = 'a[href], button, input:not([type="hidden"]), select, textarea, summary, [role="button"], [role="link"], [role="tab"], [role="checkbox"], [role="radio"]';
      const visible = (el: HTMLElement) => {
        if (!el.checkVisibility({ contentVisibilityAuto: true, opacityProperty: true, visibilityProperty: true })) return false; // closed <details>, hidden
        const r = el.getBoundingClientRect();
        const cs = getComputedStyle(el);
        return r.width > 0 && r.height > 0 && cs.visibility !== "hidden" && !el.closest("[inert], .sr-only, [hidden]") && Number(cs.opacity) > 0;
      };
      const targets = [...document.querySelectorAll<HTMLElement>(sel)].filter(visible).map((el) => {
        let r = el.getBoundingClientRect();
        const lab = (el as HTMLInputElement).labels?.[0];
        if (lab && ["checkbox", "radio"].includes((el as HTMLInputElement).type)) {
          const l = lab.getBoundingClientRect();
          const left = Math.min(r.left, l.left), top = Math.min(r.top, l.top);
          r = new DOMRect(left, top, Math.max(r.right, l.right) - left, Math.max(r.bottom, l.bottom) - top);
        }
        return { el, r };
      });
      const inline = (el: HTMLElement) => {
        if (getComputedStyle(el).display !== "inline") return false;
        let block = el.parentElement;
        while (block && getComputedStyle(block).display.startsWith("inline")) block = block.parentElement;
        return Boolean(block && (block.textContent ?? "").trim().length > (el.textContent ?? "").trim().length);
      };
      const out: string[] = [];
      for (const t of targets) {
        if (t.r.width >= 23.5 && t.r.height >= 23.5) continue;
        if (inline(t.el)) continue;
        const cx = t.r.left + t.r.width / 2, cy = t.r.top + t.r.height / 2;
        const clash = targets.some((o) => {
          if (o === t || o.el.contains(t.el) || t.el.contains(o.el)) return false;
          const nx = Math.max(o.r.left, Math.min(cx, o.r.right)), ny = Math.max(o.r.top, Math.min(cy, o.r.bottom));
          return Math.hypot(nx - cx, ny - cy) < 12;
        });
        if (clash && !out.some((o) => o.includes(name(t.el)))) out.push(`${label}: ${name(t.el)} is ${Math.round(t.r.width)}×${Math.round(t.r.height)} px with another target closer than 12 px to its centre`);
      }
      return out;
    },
    label,
  );
}

/** WCAG 1.4.1: every status pill shows a symbol and a word, never colour alone. */
export async function statusPillProblems(page: Page, label: string): Promise<string[]> {
  return page.locator("[data-status-pill]").evaluateAll(
    (pills, label) =>
      pills.flatMap((p) => {
        const mark = p.querySelector("[aria-hidden='true']")?.textContent?.trim() ?? "";
        const words = (p.textContent ?? "").replace(mark, "").trim();
        const ok = /^[^\p{L}\p{N}\s]+$/u.test(mark) && /\p{L}{2,}/u.test(words);
        return ok ? [] : [`${label}: status pill “${(p.textContent ?? "").trim()}” needs a symbol and a word`];
      }),
    label,
  );
}

/**
 * Charts (WCAG 1.1.1, 1.4.1): every drawn chart is hidden from assistive technology and its figure
 * carries the same figures as text: a table, or a caption of at least a sentence.
 */
export async function chartProblems(page: Page, label: string): Promise<string[]> {
  return page.locator(".recharts-responsive-container, .recharts-wrapper").evaluateAll(
    (charts, label) =>
      charts.flatMap((c) => {
        const fig = c.closest("figure");
        const hidden = Boolean(c.closest("[aria-hidden='true']"));
        // the figure's own words besides the drawing: a table, a caption or a sentence pointing to one
        const text = Boolean(fig?.querySelector("table")) || (fig?.textContent ?? "").length - (c.textContent ?? "").length >= 30;
        return hidden && text ? [] : [`${label}: a chart without ${hidden ? "" : "aria-hidden and "}${text ? "" : "a table or text with its figures"}`];
      }),
    label,
  );
}

/** prefers-reduced-motion: with "reduce" emulated no element animates or transitions (2.3.3). */
export async function motionProblems(page: Page, label: string): Promise<string[]> {
  return page.evaluate((label) => {
    const out: string[] = [];
    const secs = (v: string) => Math.max(...v.split(",").map((x) => (x.trim().endsWith("ms") ? parseFloat(x) / 1000 : parseFloat(x))));
    for (const el of document.querySelectorAll<HTMLElement>("*")) {
      for (const pseudo of [null, "::before", "::after"]) {
        const cs = getComputedStyle(el, pseudo);
        const anim = cs.animationName !== "none" && secs(cs.animationDuration) > 0.001;
        const trans = secs(cs.transitionDuration) > 0.001 && cs.transitionProperty !== "none";
        if (anim || trans) out.push(`${label}: ${el.tagName.toLowerCase()}.${[...el.classList].slice(0, 3).join(".")}${pseudo ?? ""} ${anim ? `animates (${cs.animationName})` : `transitions (${cs.transitionProperty})`}`);
      }
    }
    return out.slice(0, 5);
  }, label);
}

/**
 * Where the focus is, for keyboard tests: the focused element's name, whether it shows a focus
 * indicator (an outline or a box-shadow ring of at least 2 px, WCAG 2.4.7 / 2.4.13's size as a
 * yardstick) and whether a sticky or fixed box covers it (2.4.11: not entirely hidden; we ask for
 * its centre to be uncovered, which is stricter).
 */
export async function focusState(page: Page) {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return { name: "body", indicator: false, obscuredBy: null as string | null, inView: false };
    const cs = getComputedStyle(el);
    const outline = cs.outlineStyle !== "none" && parseFloat(cs.outlineWidth) >= 2;
    const ring = cs.boxShadow !== "none" && /\b([2-9]|\d{2,})px/.test(cs.boxShadow);
    const r = el.getBoundingClientRect();
    const cx = r.left + r.width / 2, cy = r.top + Math.min(r.height / 2, 12);
    let obscuredBy: string | null = null;
    for (const other of document.querySelectorAll<HTMLElement>("body *")) {
      const pos = getComputedStyle(other).position;
      if ((pos !== "sticky" && pos !== "fixed") || other.contains(el) || el.contains(other)) continue;
      const o = other.getBoundingClientRect();
      if (o.width && o.height && cx >= o.left && cx <= o.right && cy >= o.top && cy <= o.bottom) obscuredBy = `${other.tagName.toLowerCase()}.${[...other.classList].slice(0, 3).join(".")}`;
    }
    const inView = r.bottom > 0 && r.top < innerHeight;
    const label = (el.getAttribute("aria-label") || (el as HTMLInputElement).labels?.[0]?.textContent || el.textContent || "").trim().replace(/\s+/g, " ").slice(0, 60);
    return { name: `${el.tagName.toLowerCase()} ${label}`, indicator: outline || ring, obscuredBy, inView };
  });
}
