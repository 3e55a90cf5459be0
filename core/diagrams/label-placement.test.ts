import { describe, expect, it } from "vitest";
import { seededRandom } from "../testing/fixtures";
import { boxesOverlap, labelBox, monoTextSize, placeLabels, type LabelRequest } from "./label-placement";

const size = monoTextSize(12, "σ", "2", " ");

describe("placeLabels", () => {
  it("when labels do not touch, then each keeps its first (natural) spot", () => {
    const placed = placeLabels([
      { id: "a", size, candidates: [{ x: 100, y: 50, anchor: "middle" }], step: 1 },
      { id: "b", size, candidates: [{ x: 200, y: 50, anchor: "middle" }], step: 1 },
    ]);
    expect(placed.map((p) => [p.x, p.y, p.anchor])).toEqual([
      [100, 50, "middle"],
      [200, 50, "middle"],
    ]);
  });

  it("when ten labels all want one spot, then no two boxes overlap and the later ones step the way they ask", () => {
    const requests: LabelRequest[] = Array.from({ length: 10 }, (_, i) => ({
      id: `l${i}`,
      size,
      candidates: [{ x: 100, y: 100, anchor: "middle" }],
      step: 1,
    }));
    const placed = placeLabels(requests);
    for (let i = 0; i < placed.length; i++)
      for (let j = i + 1; j < placed.length; j++)
        expect(boxesOverlap(placed[i].box, placed[j].box)).toBe(false);
    expect(placed[0].y).toBe(100);
    expect(placed.slice(1).every((p) => p.y > 100)).toBe(true);
  });

  it("when 500 seeded crowds of labels are placed (clustered spots, mixed anchors and sizes), then no two boxes ever overlap", () => {
    const next = seededRandom(616);
    const anchors = ["start", "middle", "end"] as const;
    for (let run = 0; run < 500; run++) {
      const n = 2 + Math.floor(next() * 9);
      const requests: LabelRequest[] = Array.from({ length: n }, (_, i) => {
        const x = 100 + next() * 30;
        const y = 100 + next() * 20;
        return {
          id: `l${i}`,
          size: monoTextSize(12, "x".repeat(1 + Math.floor(next() * 8)), next() < 0.5 ? "max" : ""),
          candidates: [
            { x, y, anchor: anchors[Math.floor(next() * 3)] },
            { x: x - 3, y, anchor: "end" },
            { x: x + 3, y, anchor: "start" },
          ],
          step: next() < 0.5 ? -1 : 1,
        };
      });
      const placed = placeLabels(requests, { x: 50, y: 14, width: 416, height: 196 });
      for (let i = 0; i < n; i++) {
        expect(placed[i].box).toEqual(labelBox(placed[i], requests[i].size));
        for (let j = i + 1; j < n; j++) expect(boxesOverlap(placed[i].box, placed[j].box)).toBe(false);
      }
    }
  });

  it("when a label has no candidate, then it is refused with its id named", () => {
    expect(() => placeLabels([{ id: "lonely", size, candidates: [], step: 1 }])).toThrow(/lonely/);
  });
});

describe("labelBox", () => {
  it("when a text is anchored at start, middle or end, then its box starts at, centres on or ends at the anchor's x", () => {
    const s = monoTextSize(10, "ab");
    expect(s.width).toBeCloseTo(12, 12); // 2 characters × 0.6 em × 10
    expect(labelBox({ x: 0, y: 20, anchor: "start" }, s).x).toBe(0);
    expect(labelBox({ x: 0, y: 20, anchor: "middle" }, s).x).toBeCloseTo(-6, 12);
    expect(labelBox({ x: 0, y: 20, anchor: "end" }, s).x).toBeCloseTo(-12, 12);
    expect(labelBox({ x: 0, y: 20, anchor: "end" }, s).y).toBeCloseTo(12, 12);
  });
});
