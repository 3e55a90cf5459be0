import {
  estimateRows,
  PointTableParser,
  type BadRows,
  type PointColumns,
  type PointTable,
  type PointTableDecimal,
  type PointTableSeparator,
  type StressUnit,
} from "../../../core";
import { chunkAt, chunkCountOf } from "../../../db/repositories/point-table-chunks";
import type { NewPointTableChunk } from "../../../db/repositories/point-tables";

/** How a declared table's text is read: its layout, mapping, unit, and the size its rows are estimated from. */
export type UploadSetup = {
  separator: PointTableSeparator;
  decimal: PointTableDecimal;
  skipRows: number;
  header: boolean;
  columns: PointColumns;
  unit: StressUnit;
  idKind: "number" | "text";
  sizeBytes: number;
  maxRows: number;
};

/** What a finished parse found: the points counted, the bad rows, and how many chunks hold the points. */
export type UploadSummary = { count: number; hasCoordinates: boolean; badRows: BadRows; chunkCount: number };

/** A stored chunk as it crosses between threads: its binary columns as plain byte arrays. */
export type ChunkOnTheWire = Omit<NewPointTableChunk, "components" | "coordinates" | "numericIds"> & {
  components: Uint8Array;
  coordinates: Uint8Array | null;
  numericIds: Uint8Array | null;
};

/**
 * One upload's parse: the body's bytes go in as they arrive (decoded as UTF-8 across piece
 * boundaries and pushed to core's PointTableParser unchanged, so the server reads a file exactly as
 * the browser does), and after {@link finish} the table comes out one stored chunk at a time.
 */
export class UploadParse {
  private readonly decoder = new TextDecoder("utf-8");
  private parser: PointTableParser | null = null;
  private table: PointTable | null = null;

  constructor(private readonly setup: UploadSetup) {}

  push(bytes: Uint8Array): void {
    this.pushText(this.decoder.decode(bytes, { stream: true }));
  }

  finish(): UploadSummary {
    this.pushText(this.decoder.decode());
    const table = this.parser!.finish();
    this.table = table;
    return {
      count: table.count,
      hasCoordinates: table.coordinates !== null,
      badRows: table.badRows,
      chunkCount: chunkCountOf(table.count),
    };
  }

  /** Chunk `index` of the finished table, and the buffers that can move instead of being copied. */
  chunk(index: number): { chunk: ChunkOnTheWire; buffers: ArrayBuffer[] } {
    if (this.table === null) throw new Error("the upload's parse is not finished");
    const chunk = chunkAt(this.table, index);
    const buffers = [chunk.components, chunk.coordinates, chunk.numericIds]
      .filter((b) => b !== null)
      .map((b) => b.buffer as ArrayBuffer);
    return { chunk, buffers };
  }

  private pushText(text: string): void {
    // The first text sets the expected row count, so the parser's arrays rarely grow.
    this.parser ??= new PointTableParser({
      separator: this.setup.separator,
      decimal: this.setup.decimal,
      skipRows: this.setup.skipRows,
      header: this.setup.header,
      columns: this.setup.columns,
      unit: this.setup.unit,
      idKind: this.setup.idKind,
      expectedRows: Math.min(this.setup.maxRows, estimateRows(text, this.setup.sizeBytes)),
    });
    this.parser.push(text);
  }
}
