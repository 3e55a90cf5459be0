/**
 * Revision letters of a project's calculation records: the first record is revision A; a
 * resubmission after a return keeps the letter (the same revision, checked again); the first
 * submission after an approval starts the next letter. After Z come AA, AB, … as spreadsheet
 * columns count (common practice for drawing and calculation revisions, no source).
 */

/** The letter after `letter`: A → B, Z → AA, AZ → BA. */
export function nextRevisionLetter(letter: string): string {
  const digits = [...letter].map((c) => c.charCodeAt(0) - 64);
  let i = digits.length - 1;
  while (i >= 0 && digits[i] === 26) {
    digits[i] = 1;
    i -= 1;
  }
  if (i < 0) digits.unshift(1);
  else digits[i] += 1;
  return String.fromCharCode(...digits.map((d) => d + 64));
}

/** The revision the project's next record takes, from its latest record (null: none yet). */
export function revisionOfNextRecord(latest: { status: string; revision: string } | null): string {
  if (!latest) return "A";
  return latest.status === "approved" ? nextRevisionLetter(latest.revision) : latest.revision;
}
