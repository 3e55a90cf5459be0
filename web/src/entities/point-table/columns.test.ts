import { QueryClient } from "@tanstack/react-query";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "../../lib/api-client";
import { DownloadCancelled, fetchPointColumns } from "./columns";
import { pointTableKeys } from "./keys";

/** The bytes of `values` as little-endian float64, as the server writes them (Node's Buffer writer, an independent encoder). */
function littleEndian(values: number[]): Uint8Array {
  const buffer = Buffer.alloc(8 * values.length);
  values.forEach((v, i) => buffer.writeDoubleLE(v, 8 * i));
  return new Uint8Array(buffer);
}

/** A streamed answer sending `bytes` in pieces of `piece` bytes, with the point count in X-Point-Count. */
function answer(bytes: Uint8Array, count: string, piece = 16): Response {
  let at = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (at >= bytes.length) return controller.close();
      controller.enqueue(bytes.slice(at, at + piece));
      at += piece;
    },
  });
  return new Response(body, { status: 200, headers: { "X-Point-Count": count } });
}

afterEach(() => vi.unstubAllGlobals());

describe("fetchPointColumns", () => {
  it("when 2 points' nine columns arrive in pieces, then they are read as float64 in order, NaN coordinates kept, and progress reaches the whole", async () => {
    const values = [
      1e6,
      -2e6,
      3,
      4,
      5,
      6,
      7,
      8,
      9,
      10,
      11,
      12.5,
      Number.NaN,
      Number.NaN,
      0,
      0,
      -0.25,
      1e-300,
    ];
    vi.stubGlobal(
      "fetch",
      vi.fn(() => Promise.resolve(answer(littleEndian(values), "2"))),
    );
    const progress: number[] = [];
    const got = await fetchPointColumns("/api/x/columns", {
      onProgress: (r, total) => progress.push(r / total),
    });
    expect(got.count).toBe(2);
    expect(Array.from(got.columns)).toEqual(values);
    expect(progress.at(-1)).toBe(1);
    expect(progress.length).toBe(Math.ceil((8 * values.length) / 16));
  });

  it("when the answer is shorter or longer than its point count says, or has no count, then it refuses saying so", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(() => Promise.resolve(answer(littleEndian(new Array(17).fill(0)), "2"))),
    );
    await expect(fetchPointColumns("/api/x", {})).rejects.toThrow(/stopped after 136 of 144 bytes/);
    vi.stubGlobal(
      "fetch",
      vi.fn(() => Promise.resolve(answer(littleEndian(new Array(19).fill(0)), "2"))),
    );
    await expect(fetchPointColumns("/api/x", {})).rejects.toThrow(/more than the 144 bytes/);
    vi.stubGlobal(
      "fetch",
      vi.fn(() => Promise.resolve(answer(new Uint8Array(0), "many"))),
    );
    await expect(fetchPointColumns("/api/x", {})).rejects.toThrow(/X-Point-Count/);
  });

  it("when the server refuses (409 awaiting content), then its error comes back as an ApiError with its id", async () => {
    const refused = new Response(
      JSON.stringify({ error: { id: "awaiting_content", message: "Send the table's file first." } }),
      { status: 409, headers: { "Content-Type": "application/json" } },
    );
    vi.stubGlobal(
      "fetch",
      vi.fn(() => Promise.resolve(refused)),
    );
    const error = await fetchPointColumns("/api/x", {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).id).toBe("awaiting_content");
  });

  it("when the download is aborted part way, then it rejects as cancelled", async () => {
    const controller = new AbortController();
    vi.stubGlobal(
      "fetch",
      vi.fn((_url: string, init: RequestInit) => {
        // a body that sends one piece, then waits until the request is aborted
        const body = new ReadableStream<Uint8Array>({
          start(c) {
            c.enqueue(new Uint8Array(8));
            init.signal?.addEventListener("abort", () => c.error(new DOMException("aborted", "AbortError")));
          },
        });
        return Promise.resolve(new Response(body, { headers: { "X-Point-Count": "1" } }));
      }),
    );
    const pending = fetchPointColumns("/api/x", {
      signal: controller.signal,
      onProgress: () => controller.abort(),
    });
    await expect(pending).rejects.toBeInstanceOf(DownloadCancelled);
  });
});

describe("point-table keys", () => {
  it("when the case's list of tables is refreshed (a table stored or deleted), then a table's downloaded points stay fresh, while the project's scope still covers them", async () => {
    const client = new QueryClient();
    const columns = pointTableKeys.columns("w", "p", "t");
    const detail = pointTableKeys.detail("w", "p", "c", "t");
    client.setQueryData(columns, 1);
    client.setQueryData(detail, 1);
    await client.invalidateQueries({ queryKey: pointTableKeys.list("w", "p", "c") });
    expect(client.getQueryState(columns)?.isInvalidated).toBe(false);
    expect(client.getQueryState(detail)?.isInvalidated).toBe(true);
    expect(client.getQueryCache().findAll({ queryKey: ["workspace", "w"] }).length).toBe(2);
  });
});
