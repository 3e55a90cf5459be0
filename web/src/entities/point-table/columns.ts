import { ApiError, toApiError } from "../../lib/api-client";

/** How many float64 columns GET …/columns sends: xx yy zz xy yz zx (Pa), then x y z. */
export const COLUMN_COUNT = 9;

/** A stored table's points as the server sends them: `COLUMN_COUNT` columns of `count` values, one after another. */
export type PointColumnsDownload = { count: number; columns: Float64Array };

/** Thrown (as the download's rejection) when the engineer stopped it. */
export class DownloadCancelled extends Error {
  override name = "DownloadCancelled";
  constructor() {
    super("The download was cancelled.");
  }
}

/** True on a little-endian machine (every browser platform in use), where the bytes need no swapping. */
const LITTLE_ENDIAN = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

/** The bytes as float64 values, read little-endian whatever the machine's own order. */
function littleEndianFloats(bytes: Uint8Array): Float64Array {
  if (LITTLE_ENDIAN) return new Float64Array(bytes.buffer, bytes.byteOffset, bytes.byteLength / 8);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const out = new Float64Array(bytes.byteLength / 8);
  for (let i = 0; i < out.length; i++) out[i] = view.getFloat64(8 * i, true);
  return out;
}

const unexpected = (message: string) => new ApiError(200, "unexpected_answer", message);

/**
 * Downloads a stored table's binary columns (GET …/:tableId/columns, little-endian float64, the
 * count in X-Point-Count) into one buffer sized from that count, so tens of megabytes are neither
 * copied nor joined from pieces; `onProgress` gets the bytes received and the total. Aborting
 * `signal` rejects with {@link DownloadCancelled}.
 */
export async function fetchPointColumns(
  url: string,
  { signal, onProgress }: { signal?: AbortSignal; onProgress?: (received: number, total: number) => void },
): Promise<PointColumnsDownload> {
  let response: Response;
  try {
    response = await fetch(url, { credentials: "same-origin", signal });
  } catch (error) {
    if (signal?.aborted) throw new DownloadCancelled();
    throw error instanceof ApiError
      ? error
      : new ApiError(0, "network", "The server cannot be reached. Check that Sigmacube is running.");
  }
  if (!response.ok) throw await toApiError(response);
  const count = Number(response.headers.get("X-Point-Count"));
  if (!Number.isSafeInteger(count) || count < 0) {
    throw unexpected("The server's answer did not say how many points the table holds (X-Point-Count).");
  }
  const total = COLUMN_COUNT * 8 * count;
  const bytes = new Uint8Array(total);
  let received = 0;
  const reader = response.body?.getReader();
  try {
    while (reader !== undefined) {
      const next = await reader.read();
      if (next.done) break;
      if (received + next.value.byteLength > total) {
        throw unexpected(`The server sent more than the ${total} bytes its ${count} points take.`);
      }
      bytes.set(next.value, received);
      received += next.value.byteLength;
      onProgress?.(received, total);
    }
  } catch (error) {
    if (signal?.aborted) throw new DownloadCancelled();
    throw error;
  }
  if (received !== total) {
    throw unexpected(`The download stopped after ${received} of ${total} bytes; open the results again.`);
  }
  return { count, columns: littleEndianFloats(bytes) };
}
