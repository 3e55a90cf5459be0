/**
 * The points in 3D (react-three-fiber, loaded as its own chunk), one THREE.Points with a colour
 * per point from the utilisation colour table: one draw call, so a million points turn smoothly.
 * It draws only: positions are the table's coordinates scaled into a unit box, colours come from
 * model/colour-scale.ts, and a click hands the point's index back. Above 200,000 points it draws a
 * sample (model/cloud-sample.ts) and says so.
 */
import { OrbitControls } from "@react-three/drei";
import { Canvas, type ThreeEvent } from "@react-three/fiber";
import { useMemo } from "react";
import { BufferAttribute, BufferGeometry } from "three";
import { cloudSample } from "../model/cloud-sample";
import { colourTable, fillColours } from "../model/colour-scale";

/**
 * Coordinates (3 per point) into a box of half-size 1 around the origin, keeping proportions; the
 * box is the whole table's, the output only the points in `indices` (all when null).
 */
function unitPositions(coordinates: Float64Array, indices: Uint32Array | null): Float32Array {
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < coordinates.length; i += 3) {
    for (let a = 0; a < 3; a++) {
      const v = coordinates[i + a];
      if (v < lo[a]) lo[a] = v;
      if (v > hi[a]) hi[a] = v;
    }
  }
  const centre = lo.map((l, a) => (l + hi[a]) / 2);
  const span = Math.max(...hi.map((h, a) => h - lo[a])) || 1;
  const count = indices ? indices.length : coordinates.length / 3;
  const out = new Float32Array(3 * count);
  for (let k = 0; k < count; k++) {
    const i = 3 * (indices ? indices[k] : k);
    for (let a = 0; a < 3; a++) out[3 * k + a] = (2 * (coordinates[i + a] - centre[a])) / span;
  }
  return out;
}

export default function PointCloud({
  coordinates,
  utilisation,
  onPick,
}: {
  coordinates: Float64Array;
  utilisation: Float64Array;
  onPick: (index: number) => void;
}) {
  const sample = useMemo(() => cloudSample(utilisation), [utilisation]);
  const geometry = useMemo(() => {
    const g = new BufferGeometry();
    const { indices } = sample;
    g.setAttribute("position", new BufferAttribute(unitPositions(coordinates, indices), 3));
    const drawnUtilisation = indices ? Float64Array.from(indices, (i) => utilisation[i]) : utilisation;
    const colours = fillColours(
      drawnUtilisation,
      colourTable(),
      new Float32Array(3 * drawnUtilisation.length),
    );
    g.setAttribute("color", new BufferAttribute(colours, 3));
    g.computeBoundingSphere();
    return g;
  }, [coordinates, utilisation, sample]);

  const onClick = (e: ThreeEvent<MouseEvent>) => {
    e.stopPropagation();
    if (e.index !== undefined) onPick(sample.indices ? sample.indices[e.index] : e.index);
  };

  return (
    <>
      {sample.indices && (
        <p
          className="absolute left-2 top-1 z-10 rounded-sm bg-panel/90 px-1.5 text-[12px] text-graphite"
          data-testid="point-cloud-sample"
        >
          Drawing <span className="num">{sample.drawn.toLocaleString("en")}</span> of{" "}
          <span className="num">{sample.total.toLocaleString("en")}</span> points: every point with u ≥{" "}
          <span className="num">{sample.keptFrom!.toFixed(3)}</span> and an even share of the rest.
        </p>
      )}
      <Canvas
        frameloop="demand"
        camera={{ position: [2.2, 1.8, 2.6], fov: 40 }}
        raycaster={{
          params: { Points: { threshold: 0.02 }, Mesh: {}, Line: { threshold: 1 }, LOD: {}, Sprite: {} },
        }}
        data-testid="point-cloud"
      >
        <points geometry={geometry} onClick={onClick}>
          <pointsMaterial size={3} sizeAttenuation={false} vertexColors />
        </points>
        <axesHelper args={[1.2]} />
        <OrbitControls makeDefault enableDamping={false} />
      </Canvas>
    </>
  );
}
