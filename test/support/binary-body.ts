/**
 * A supertest body parser that collects a binary answer (a PDF) into one Buffer; supertest keeps a
 * binary body as a Buffer only when told how to collect it. Use as `.parse(binaryBody as never)`.
 */
export function binaryBody(
  res: NodeJS.ReadableStream,
  done: (error: Error | null, body: Buffer) => void,
): void {
  const chunks: Buffer[] = [];
  res.on("data", (c: Buffer) => chunks.push(c));
  res.on("end", () => done(null, Buffer.concat(chunks)));
}
