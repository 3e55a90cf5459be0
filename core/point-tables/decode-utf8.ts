/** U+FFFD, what a decoder writes for bytes that are not UTF-8 (as TextDecoder does by default). */
const REPLACEMENT = 0xfffd;

/**
 * The text of the UTF-8 bytes `bytes[start, end)`: for the few lines the byte parser hands to the
 * text parser (headers, skipped lines, bad rows, quoted or non-ASCII fields). core may use neither
 * the DOM's nor Node's TextDecoder, and a line is short, so a plain loop is enough. Malformed
 * sequences (a stray continuation byte, a truncated, overlong or surrogate sequence, a value over
 * U+10FFFF) become U+FFFD, one per maximal bad subsequence as the WHATWG Encoding Standard's
 * decoder does (TextDecoder's default).
 */
export function decodeUtf8(bytes: Uint8Array, start: number, end: number): string {
  const units: number[] = [];
  let i = start;
  while (i < end) {
    const b = bytes[i++];
    if (b < 0x80) {
      units.push(b);
      continue;
    }
    // the lead byte fixes the length and the allowed range of the first continuation byte
    let need: number;
    let cp: number;
    let lower = 0x80;
    let upper = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) {
      need = 1;
      cp = b & 0x1f;
    } else if (b >= 0xe0 && b <= 0xef) {
      need = 2;
      cp = b & 0x0f;
      if (b === 0xe0) lower = 0xa0;
      if (b === 0xed) upper = 0x9f;
    } else if (b >= 0xf0 && b <= 0xf4) {
      need = 3;
      cp = b & 0x07;
      if (b === 0xf0) lower = 0x90;
      if (b === 0xf4) upper = 0x8f;
    } else {
      units.push(REPLACEMENT);
      continue;
    }
    let ok = true;
    for (let k = 0; k < need; k++) {
      const c = i < end ? bytes[i] : -1;
      if (c < lower || c > upper) {
        ok = false;
        break;
      }
      lower = 0x80;
      upper = 0xbf;
      cp = (cp << 6) | (c & 0x3f);
      i++;
    }
    if (!ok) units.push(REPLACEMENT);
    else if (cp < 0x10000) units.push(cp);
    else units.push(0xd800 + ((cp - 0x10000) >> 10), 0xdc00 + ((cp - 0x10000) & 0x3ff));
  }
  let out = "";
  // in slices, since String.fromCharCode takes its arguments on the stack
  for (let k = 0; k < units.length; k += 8192) out += String.fromCharCode(...units.slice(k, k + 8192));
  return out;
}
