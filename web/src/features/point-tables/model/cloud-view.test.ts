import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { cloudBuffers } from "./cloud-buffers";
import { cloudSample } from "./cloud-sample";
import { cloudView, cloudViewInSlices, cloudViewTransferables } from "./cloud-view";

function ratedPoints(n: number, seed: number) {
  const random = seededRandom(seed);
  return {
    coordinates: Float64Array.from({ length: 3 * n }, () => 500 * random()),
    utilisation: Float64Array.from({ length: n }, () => (random() < 0.02 ? Number.NaN : 1.4 * random())),
  };
}

describe("what the 3D view draws (sample and arrays together)", () => {
  it("when the table is larger than the budget, then the view draws the sample cloudSample picks, with the arrays cloudBuffers gives for those points", () => {
    const { coordinates, utilisation } = ratedPoints(20_000, 3);
    const view = cloudView(coordinates, utilisation, 2_000);
    const sample = cloudSample(utilisation, 2_000);
    expect(view.sample).toEqual(sample);
    const buffers = cloudBuffers(coordinates, utilisation, sample.indices);
    expect(view.positions).toEqual(buffers.positions);
    expect(view.colours).toEqual(buffers.colours);
    expect(view.sphere).toEqual(buffers.sphere);
  });

  it("when the view is made on the page in slices of 1,000 points, then it equals the view made in one go (sampled or not), and each pass paused between slices", async () => {
    const { coordinates, utilisation } = ratedPoints(20_000, 11);
    let pauses = 0;
    const sliced = await cloudViewInSlices(coordinates, utilisation, {
      slice: 1_000,
      pause: async () => void pauses++,
    });
    expect(sliced).toEqual(cloudView(coordinates, utilisation));
    const sampled = await cloudViewInSlices(coordinates, utilisation, {
      slice: 1_000,
      maxDrawn: 3_000,
      pause: async () => {},
    });
    expect(sampled!.sample.drawn).toBe(3_000);
    expect(sampled).toEqual(cloudView(coordinates, utilisation, 3_000));
    // at least one pause per slice of the first pass over 20,000 points
    expect(pauses).toBeGreaterThanOrEqual(20);
  });

  it("when the view's making is cancelled, then it gives null", async () => {
    const { coordinates, utilisation } = ratedPoints(5_000, 2);
    const made = await cloudViewInSlices(coordinates, utilisation, {
      slice: 500,
      pause: async () => {},
      isCancelled: () => true,
    });
    expect(made).toBeNull();
  });

  it("when a sampled view is transferred, then its positions, colours and sample indices are named once each; a full view has no indices", () => {
    const { coordinates, utilisation } = ratedPoints(3_000, 8);
    const sampled = cloudView(coordinates, utilisation, 1_000);
    expect(cloudViewTransferables(sampled)).toEqual([
      sampled.positions.buffer,
      sampled.colours.buffer,
      sampled.sample.indices!.buffer,
    ]);
    const full = cloudView(coordinates, utilisation);
    expect(full.sample.indices).toBeNull();
    expect(cloudViewTransferables(full)).toHaveLength(2);
    expect(cloudViewTransferables(null)).toEqual([]);
  });
});
