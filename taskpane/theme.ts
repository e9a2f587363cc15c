/**
 * Follows the Office theme: takes the body colours Office reports and switches the pane's palette to
 * dark when the background is dark, keeping text contrast ≥ 4.5:1 (WCAG 2.1 relative luminance).
 */

/** Relative luminance of a #rrggbb colour (WCAG 2.1 §1.4.3 definition). */
export function luminance(hex: string): number {
  const m = /^#?([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex.trim());
  if (!m) return 1;
  const [r, g, b] = m.slice(1).map((x) => {
    const c = parseInt(x, 16) / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** Contrast ratio of two colours (WCAG 2.1). */
export function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/**
 * Applies Office's theme colours where they keep contrast, and the dark palette on dark backgrounds.
 * @returns true when the theme is dark
 */
export function applyOfficeTheme(theme: Office.OfficeTheme | undefined): boolean {
  if (!theme?.bodyBackgroundColor) return false;
  const root = document.documentElement;
  const dark = luminance(theme.bodyBackgroundColor) < 0.2;
  root.classList.toggle("dark", dark);
  const bg = theme.bodyBackgroundColor;
  const fg = theme.bodyForegroundColor;
  if (fg && contrast(bg, fg) >= 4.5) {
    root.style.setProperty("--bg", bg);
    root.style.setProperty("--fg", fg);
  }
  return dark;
}
