/**
 * Reads one number typed into one field. A true minus sign (−) is a minus. A field holds one value,
 * so a comma in it is a decimal comma or a thousands separator, never a value separator; a comma
 * followed by exactly three digits ("1,000", "12,500") could be either and is refused, any other
 * single comma is a decimal comma ("1,5" = 1.5) (product rule).
 * @returns the number (NaN when the text is not one), or why the text is refused
 */
export function readNumberText(text: string): { value: number } | { refused: string } {
  const t = text.trim().replace(/\u2212/g, "-");
  if (/^[+-]?\d{1,3},\d{3}$/.test(t)) {
    const [whole, rest] = t.split(",");
    return {
      refused: `“${text.trim()}” is ambiguous: ${whole}.${rest} with a decimal comma, or ${whole}${rest} with a thousands separator — type it with a point or without the comma`,
    };
  }
  const commas = (t.match(/,/g) ?? []).length;
  if (commas === 1 && !t.includes(".")) return { value: Number(t.replace(",", ".")) };
  return { value: commas === 0 ? Number(t) : Number.NaN };
}
