/**
 * The points in 3D (react-three-fiber, loaded as its own chunk), one THREE.Points with a colour
 * per point from the utilisation colour table: one draw call, so a million points turn smoothly.
 * It draws only: what it draws (the sample above 200,000 points, positions in a unit box, colours,
 * bounding sphere) comes made (model/cloud-view.ts), and a click hands the point's index back.
 *
 * It paints a picture a slice of points per frame on top of the last (the drawing buffer is kept),
 * starting again whenever the camera or the canvas changes: headless Chromium draws WebGL in
 * software, where 200,000 points in one frame held the page for 600–800 ms
 * (scripts/bench/point-tables-browser.ts, BENCH_POINT_TRACE=1: the main thread waiting on the GPU
 * process). Its first frame only compiles the shaders, so that wait is not added to a draw's.
 */
import { OrbitControls } from "@react-three/drei";
import { Canvas, useFrame, type ThreeEvent } from "@react-three/fiber";
import { useMemo, useRef } from "react";
import { BufferAttribute, BufferGeometry, Color, Sphere, Vector3 } from "three";
import type { CloudView } from "../model/cloud-view";

/** Points drawn per frame: in software WebGL about 3–4 µs each, so a frame stays near 30 ms. */
export const POINTS_PER_FRAME = 8_000;

/** The CSS colour of the nearest box behind `element` that has a background of its own. */
function backgroundBehind(element: HTMLElement): string {
  for (let e: HTMLElement | null = element; e !== null; e = e.parentElement) {
    const colour = getComputedStyle(e).backgroundColor;
    if (colour !== "" && colour !== "transparent" && !/^rgba\(.*,\s*0\)$/.test(colour)) return colour;
  }
  return "#ffffff";
}

/**
 * Draws the scene's points a slice per frame, from the start again when the view (camera, canvas
 * size, points) changes; tells `onDrawn` how many points the picture holds after each slice.
 */
function SlicedDrawing({
  geometry,
  count,
  onDrawn,
}: {
  geometry: BufferGeometry;
  count: number;
  onDrawn: (drawn: number) => void;
}) {
  const progress = useRef({
    shown: false,
    compiled: null as WebGLSync | null | "ready",
    drawnTo: 0,
    fresh: true,
    view: "",
  });
  useFrame(({ gl, scene, camera, size, invalidate }) => {
    const p = progress.current;
    const context = gl.getContext();
    if (!p.shown) {
      // the new canvas is shown empty first: showing it reads it back from the GPU process, which
      // would otherwise wait there for the shaders' compilation as well
      p.shown = true;
      invalidate();
      return;
    }
    if (p.compiled === null) {
      // the shaders compile in the GPU process while the page goes on; a fence says when it is done
      gl.compile(scene, camera);
      p.compiled =
        context instanceof WebGL2RenderingContext
          ? context.fenceSync(context.SYNC_GPU_COMMANDS_COMPLETE, 0)
          : "ready";
      context.flush();
      invalidate();
      return;
    }
    if (p.compiled !== "ready") {
      const c = context as WebGL2RenderingContext;
      // asks without waiting: the answer changes only between tasks
      if (c.getSyncParameter(p.compiled, c.SYNC_STATUS) !== c.SIGNALED) {
        invalidate();
        return;
      }
      c.deleteSync(p.compiled);
      p.compiled = "ready";
    }
    const view = [
      geometry.uuid,
      ...camera.position.toArray(),
      ...camera.quaternion.toArray(),
      size.width,
      size.height,
    ].join();
    if (view !== p.view) {
      p.view = view;
      p.drawnTo = 0;
      p.fresh = true;
    }
    if (!p.fresh && p.drawnTo >= count) return;
    gl.autoClear = false;
    if (p.fresh) {
      // a kept drawing buffer is shown opaque here, so the picture is cleared to the colour behind it
      gl.setClearColor(new Color(backgroundBehind(gl.domElement)), 1);
      gl.clear();
    }
    p.fresh = false;
    const to = Math.min(count, p.drawnTo + POINTS_PER_FRAME);
    geometry.setDrawRange(p.drawnTo, to - p.drawnTo);
    gl.render(scene, camera);
    // a click looks for the point among all of them
    geometry.setDrawRange(0, Infinity);
    p.drawnTo = to;
    onDrawn(to);
    if (to < count) invalidate();
  }, 1);
  return null;
}

export default function PointCloud({
  view,
  onPick,
  onDrawn = () => {},
}: {
  view: CloudView;
  onPick: (index: number) => void;
  /** how many points the picture holds, after each frame's slice */
  onDrawn?: (drawn: number) => void;
}) {
  const { sample } = view;
  const geometry = useMemo(() => {
    const g = new BufferGeometry();
    g.setAttribute("position", new BufferAttribute(view.positions, 3));
    g.setAttribute("color", new BufferAttribute(view.colours, 3));
    const [x, y, z] = view.sphere.centre;
    g.boundingSphere = new Sphere(new Vector3(x, y, z), view.sphere.radius);
    return g;
  }, [view]);

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
        // kept between frames, since each frame adds a slice of points to the picture
        gl={{ preserveDrawingBuffer: true, antialias: false }}
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
        <SlicedDrawing geometry={geometry} count={sample.drawn} onDrawn={onDrawn} />
      </Canvas>
    </>
  );
}
