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

const ONE_NUMBER = /^[+\-\u2212]?(?:\d+[.,]?\d*|[.,]\d+)(?:[eE][-+]?\d+)?$/;
const ANY_NUMBER = /[-+\u2212]?\d*\.?\d+(?:[eE][-+]?\d+)?/g;

/**
 * True when pasted text holds more than one number (a matrix or a row to read as a whole), false
 * for one number, including one written with a decimal comma ("1,5"), which belongs in the field.
 * @param text the clipboard's plain text
 */
export function looksLikeSeveralNumbers(text: string): boolean {
  const t = text.trim();
  if (ONE_NUMBER.test(t)) return false;
  return (t.match(ANY_NUMBER) ?? []).length > 1;
}
