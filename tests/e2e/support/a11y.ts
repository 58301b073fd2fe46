import AxeBuilder from "@axe-core/playwright";
import { expect, type Locator, type Page } from "@playwright/test";

/** WCAG 2.0 and 2.1, levels A and AA: what the district's pages promise. */
export const WCAG_21_AA_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

type AxeResults = Awaited<ReturnType<AxeBuilder["analyze"]>>;
type Violation = AxeResults["violations"][number];

/** One block per rule: what is wrong, where, and what axe says would fix it. */
export function describeViolations(violations: Violation[]): string {
  return violations
    .map((v) => {
      const nodes = v.nodes
        .map((n) => {
          const summary = (n.failureSummary ?? "").replace(/\s*\n\s*/g, " ").trim();
          return `    at ${n.target.join(" ")}\n      ${n.html.slice(0, 160)}\n      ${summary}`;
        })
        .join("\n");
      return `  ${v.id} (${v.impact ?? "no impact given"}): ${v.help}\n    ${v.helpUrl}\n${nodes}`;
    })
    .join("\n");
}

/** Runs axe with the WCAG 2.1 A/AA rules and fails with a readable list. The page must come from browser.newContext(). */
export async function expectNoAxeViolations(page: Page, label: string): Promise<void> {
  const results = await new AxeBuilder({ page }).withTags(WCAG_21_AA_TAGS).analyze();
  expect(results.violations.length, `${label}: ${results.violations.length} WCAG 2.1 A/AA violations\n${describeViolations(results.violations)}`).toBe(0);
}

/** How far the page itself scrolls sideways, in CSS pixels (0 when it does not). */
export async function sidewaysScroll(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

/**
 * Visible elements that stick out of the viewport or whose content their own box cuts off, leaving
 * out anything inside a container that scrolls on its own (a data table in its scroll region is
 * allowed by WCAG 1.4.10) and anything visually hidden on purpose (sr-only text, the honeypot).
 */
export async function cutOffContent(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const viewport = document.documentElement.clientWidth;
    const hiddenOnPurpose = new Map<Element, boolean>();
    const isHidden = (el: Element | null): boolean => {
      if (!el || el === document.body) return false;
      const known = hiddenOnPurpose.get(el);
      if (known !== undefined) return known;
      const s = getComputedStyle(el);
      const r = el.getBoundingClientRect();
      const clipsItself = s.overflow !== "visible" || s.clip !== "auto" || s.clipPath !== "none";
      const hidden =
        s.display === "none" ||
        s.visibility === "hidden" ||
        el.getAttribute("aria-hidden") === "true" ||
        (clipsItself && (r.width <= 1 || r.height <= 1)) ||
        isHidden(el.parentElement);
      hiddenOnPurpose.set(el, hidden);
      return hidden;
    };
    const scrollsOnItsOwn = (el: Element): boolean => {
      for (let p = el.parentElement; p && p !== document.body; p = p.parentElement) {
        const o = getComputedStyle(p).overflowX;
        if (o === "auto" || o === "scroll") return true;
      }
      return false;
    };
    const name = (el: Element) => {
      const id = el.id ? `#${el.id}` : "";
      const cls = typeof el.className === "string" && el.className ? `.${el.className.trim().split(/\s+/).slice(0, 3).join(".")}` : "";
      const text = (el.textContent ?? "").trim().replace(/\s+/g, " ").slice(0, 50);
      return `<${el.tagName.toLowerCase()}${id}${cls}> "${text}"`;
    };
    const problems: string[] = [];
    for (const el of Array.from(document.body.querySelectorAll("*"))) {
      if (el instanceof HTMLScriptElement || el instanceof HTMLStyleElement || el instanceof HTMLTemplateElement) continue;
      if (isHidden(el)) continue;
      const r = el.getBoundingClientRect();
      if (r.width === 0 && r.height === 0) continue;
      if (scrollsOnItsOwn(el)) continue;
      if (r.right > viewport + 1 || r.left < -1) {
        problems.push(`${name(el)} spans ${Math.round(r.left)}–${Math.round(r.right)} px of a ${viewport} px viewport`);
        continue;
      }
      const s = getComputedStyle(el);
      const clipsX = s.overflowX === "hidden" || s.overflowX === "clip";
      const clipsY = s.overflowY === "hidden" || s.overflowY === "clip";
      if (clipsX && el.scrollWidth > el.clientWidth + 1) problems.push(`${name(el)} cuts off ${el.scrollWidth - el.clientWidth} px of its content sideways`);
      if (clipsY && el.scrollHeight > el.clientHeight + 1) problems.push(`${name(el)} cuts off ${el.scrollHeight - el.clientHeight} px of its content at the bottom`);
    }
    return problems;
  });
}

export interface FocusedElement {
  description: string;
  visibleBox: boolean;
  indicator: string | null;
}

/** The focused element, and what draws its focus indicator (an outline or a box-shadow ring), or null when nothing does. */
export async function focusedElement(page: Page): Promise<FocusedElement | null> {
  return page.evaluate(() => {
    const el = document.activeElement;
    if (!el || el === document.body || el === document.documentElement) return null;
    const s = getComputedStyle(el);
    const r = el.getBoundingClientRect();
    const outline = s.outlineStyle !== "none" && parseFloat(s.outlineWidth) > 0 ? `outline ${s.outlineWidth} ${s.outlineStyle} ${s.outlineColor}` : null;
    const ring = s.boxShadow && s.boxShadow !== "none" ? `box-shadow ${s.boxShadow}` : null;
    const label = (el.getAttribute("aria-label") ?? el.textContent ?? "").trim().replace(/\s+/g, " ").slice(0, 40);
    return {
      description: `<${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""}> "${label}"`,
      visibleBox: r.width > 1 && r.height > 1,
      indicator: outline ?? ring,
    };
  });
}

/** Presses Tab until `target` has focus: the keyboard is the only way in. */
export async function tabTo(page: Page, target: Locator, maxPresses = 60, key: "Tab" | "Shift+Tab" = "Tab"): Promise<void> {
  for (let i = 0; i < maxPresses; i += 1) {
    if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) return;
    await page.keyboard.press(key);
  }
  throw new Error(`could not reach ${target.toString()} with ${key} in ${maxPresses} presses`);
}

/**
 * After a failed submit: every listed field is marked aria-invalid and described by its message;
 * focus is on the first invalid field or on an error summary; and a live region (role=alert or
 * status, or aria-live) holds words about the problem, so a screen reader hears it.
 */
export async function expectErrorsAnnounced(page: Page, form: Locator, fields: { id: string; message: string | RegExp }[]): Promise<void> {
  for (const { id, message } of fields) {
    const field = form.locator(`[id="${id}"]`);
    await expect(field, `${id} is marked invalid`).toHaveAttribute("aria-invalid", "true");
    const describedBy = (await field.getAttribute("aria-describedby")) ?? "";
    const ids = describedBy.split(/\s+/).filter(Boolean);
    expect(ids.length, `${id} has aria-describedby`).toBeGreaterThan(0);
    const descriptions = await Promise.all(ids.map(async (d) => ((await page.locator(`[id="${d}"]`).count()) ? await page.locator(`[id="${d}"]`).innerText() : "")));
    const joined = descriptions.join(" ");
    if (typeof message === "string") expect(joined, `${id}'s description`).toContain(message);
    else expect(joined, `${id}'s description`).toMatch(message);
  }

  const firstInvalid = form.locator('[aria-invalid="true"]').first();
  const focus = await page.evaluate(() => {
    const el = document.activeElement;
    return { id: el?.id ?? "", role: el?.getAttribute("role") ?? "", invalid: el?.getAttribute("aria-invalid") ?? "" };
  });
  const firstId = await firstInvalid.getAttribute("id");
  const onSummary = focus.role === "alert" || focus.role === "group" || /summary/.test(focus.id);
  expect(focus.id === firstId || onSummary, `focus is on the first invalid field (#${firstId}) or an error summary, not #${focus.id}`).toBe(true);

  const live = page.locator('[role="alert"], [role="status"], [aria-live="polite"], [aria-live="assertive"]');
  const texts = await live.allInnerTexts();
  const first = fields[0]!.message;
  const heard = texts.some((t) => (typeof first === "string" ? t.includes(first) : first.test(t)) || /to fix|need a change|needs a change/i.test(t));
  expect(heard, `a live region announces the problem; live regions say: ${JSON.stringify(texts)}`).toBe(true);
}
