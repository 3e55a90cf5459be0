/**
 * Where to cut a file into `parts` runs of whole lines for the workers, in bytes: core's lineCuts
 * does this for a string, but a file of many megabytes is never decoded on the page (the workers
 * decode their own slices), so here a small window around each place is read and cut just after
 * its first line break. A UTF-8 line-feed byte never occurs inside a multi-byte character.
 */

/** How far past each place a line break is looked for. */
const WINDOW = 1 << 16;
const LF = 10;

/** The byte offsets just after a line break, ascending, `parts − 1` of them (fewer when lines are long). */
export async function byteLineCuts(file: Blob, parts: number): Promise<number[]> {
  if (!Number.isInteger(parts) || parts < 1)
    throw new RangeError(`parts must be an integer ≥ 1, got ${parts}`);
  const cuts: number[] = [];
  for (let k = 1; k < parts; k++) {
    const at = Math.floor((k * file.size) / parts);
    const window = new Uint8Array(await file.slice(at, at + WINDOW).arrayBuffer());
    const nl = window.indexOf(LF);
    if (nl < 0) continue;
    const cut = at + nl + 1;
    if (cut >= file.size) break;
    if (cuts.length === 0 || cut > cuts[cuts.length - 1]) cuts.push(cut);
  }
  return cuts;
}
