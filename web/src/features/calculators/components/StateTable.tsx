import type { ReactNode } from "react";
import { Quantity, stressTone } from "../../../components/Quantity";
import { sheetValue } from "../../../lib/number-format";

/** One stress of a result: its symbol, what it is and along which axis, and its value. */
export type StateRow = { id: string; symbol: ReactNode; meaning: ReactNode; value: number };

/**
 * The stresses a calculator produces, each with its symbol, the element's axis it acts on in words
 * (hoop, axial, radial; x along the shaft) and its value with the unit. `data-value` keeps the full
 * number so a test can compare it with what the bench shows.
 */
export function StateTable({
  rows,
  unit,
  caption,
}: {
  rows: readonly StateRow[];
  unit: string;
  caption: string;
}) {
  const scale = Math.max(0, ...rows.map((r) => Math.abs(r.value)));
  return (
    <table className="w-full text-[14px]">
      <caption className="sr-only">{caption}</caption>
      <tbody>
        {rows.map((r) => (
          <tr key={r.id} className="border-b border-rule last:border-0" data-testid={`calc-${r.id}`}>
            <th scope="row" className="w-16 py-1 pr-2 text-left font-normal">
              {r.symbol}
            </th>
            <td className="py-1 pr-2 text-graphite-soft">{r.meaning}</td>
            <td className="py-1 text-right" data-value={r.value}>
              <Quantity value={sheetValue(r.value)} unit={unit} tone={stressTone(r.value, scale)} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
