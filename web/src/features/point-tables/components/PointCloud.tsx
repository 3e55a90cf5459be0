/**
 * The points in 3D (react-three-fiber, loaded as its own chunk), one THREE.Points with a colour
 * per point from the utilisation colour table.
 * It draws only: what it draws (the sample above 200,000 points, positions in a unit box, colours,
 * bounding sphere) comes made (model/cloud-view.ts), and a click hands the point's index back.
 *
 * It paints a picture a slice of points per frame on top of the last (the drawing buffer is kept;
 * the slice follows how long frames take, model/draw-pace.ts),
 * starting again whenever the camera or the canvas changes: headless Chromium draws WebGL in
 * software, where 200,000 points in one frame held the page for 600–800 ms
 * (scripts/bench/point-tables-browser.ts, BENCH_POINT_TRACE=1: the main thread waiting on the GPU
 * process). Its first frames get the canvas, shaders and buffers ready one step a frame (Stage).
 */
import { OrbitControls } from "@react-three/drei";
import { Canvas, useFrame, type ThreeEvent } from "@react-three/fiber";
import { useMemo, useRef } from "react";
import {
  BufferAttribute,
  BufferGeometry,
  Color,
  Sphere,
  Vector3,
  WebGLRenderer,
  type Points,
  type WebGLRendererParameters,
} from "three";
import type { CloudView } from "../model/cloud-view";
import { FIRST_SLICE, nextSlice } from "../model/draw-pace";
import { yieldToPage } from "../model/steps";

/**
 * The renderer, made in two tasks: the WebGL context first (the GPU process starts it meanwhile),
 * then three.js's renderer on it; together they were one task of 50–70 ms in software WebGL. The
 * drawing buffer is kept between frames, since each frame adds a slice of points to the picture.
 */
async function rendererInTwoTasks(defaults: WebGLRendererParameters): Promise<WebGLRenderer> {
  const attributes = {
    alpha: true,
    antialias: false,
    preserveDrawingBuffer: true,
    powerPreference: "high-performance",
  } as const;
  const canvas = defaults.canvas as HTMLCanvasElement;
  const context = canvas.getContext("webgl2", attributes) as WebGL2RenderingContext | null;
  await yieldToPage();
  return new WebGLRenderer({ ...defaults, ...attributes, ...(context === null ? {} : { context }) });
}

/** The CSS colour of the nearest box behind `element` that has a background of its own. */
function backgroundBehind(element: HTMLElement): string {
  for (let e: HTMLElement | null = element; e !== null; e = e.parentElement) {
    const colour = getComputedStyle(e).backgroundColor;
    if (colour !== "" && colour !== "transparent" && !/^rgba\(.*,\s*0\)$/.test(colour)) return colour;
  }
  return "#ffffff";
}

/**
 * What the first frames do, one step each, so that no frame waits long on the GPU process (in
 * software WebGL each of these made the page wait 30–200 ms, and all of them together in one frame):
 * show the new canvas empty (its first read-back waits for the context's start), compile the
 * shaders and put a fence after them, wait for the fence without blocking, link the points'
 * program on a one-point stand-in (three.js's first use of a program waits for the link), draw the
 * stand-in's one point (software WebGL compiles a program's machine code at its first draw), link
 * and draw the axes' program likewise, upload the points' buffers, then draw (the first picture
 * clears the stand-in's point and the axes' first drawing away).
 */
type Stage = "show" | "compile" | { fence: WebGLSync } | "link" | "pipeline" | "axes" | "upload" | "draw";

/** The steps after the fence, in order: what each prepares. */
const PREPARED: Record<
  "link" | "pipeline" | "axes" | "upload",
  { next: Stage; standIn: boolean; points: number; axes: boolean }
> = {
  link: { next: "pipeline", standIn: true, points: 0, axes: false },
  pipeline: { next: "axes", standIn: true, points: 1, axes: false },
  axes: { next: "upload", standIn: true, points: 0, axes: true },
  upload: { next: "draw", standIn: false, points: 0, axes: false },
};

/** The name the axes go by in the scene. */
const AXES_NAME = "axes";

/** The name the points go by in the scene, where the drawing finds them. */
const POINTS_NAME = "rated-points";

/** A one-point geometry with the points' attributes, to link their program without their buffers. */
const standIn = () => {
  const g = new BufferGeometry();
  g.setAttribute("position", new BufferAttribute(new Float32Array(3), 3));
  g.setAttribute("color", new BufferAttribute(new Float32Array(3), 3));
  return g;
};

/**
 * Draws the scene's points a slice per frame, from the start again when the view (camera, canvas
 * size, points) changes; tells `onDrawn` how many points the picture holds after each slice.
 */
function SlicedDrawing({ count, onDrawn }: { count: number; onDrawn: (drawn: number) => void }) {
  const progress = useRef({
    stage: "show" as Stage,
    drawnTo: 0,
    fresh: true,
    view: "",
    slice: FIRST_SLICE,
    /** when the last slice's frame began (ms), 0 when the last frame drew no slice */
    sliceAt: 0,
  });
  useFrame(({ gl, scene, camera, size, invalidate }) => {
    const p = progress.current;
    const object = scene.getObjectByName(POINTS_NAME) as Points | undefined;
    if (object === undefined) return;
    const geometry = object.geometry;
    const context = gl.getContext();
    gl.autoClear = false;
    const axes = scene.getObjectByName(AXES_NAME);
    // draws `points` of `with_` (none or the stand-in's one), so three.js prepares their program
    // and buffers, with or without the axes
    const prepare = (with_: BufferGeometry, points: number, withAxes: boolean) => {
      object.geometry = with_;
      with_.setDrawRange(0, points);
      if (axes !== undefined) axes.visible = withAxes;
      gl.render(scene, camera);
      if (axes !== undefined) axes.visible = true;
      with_.setDrawRange(0, Infinity);
      object.geometry = geometry;
    };
    if (p.stage !== "draw") {
      if (p.stage === "show") p.stage = "compile";
      else if (p.stage === "compile") {
        gl.compile(scene, camera);
        p.stage =
          context instanceof WebGL2RenderingContext
            ? { fence: context.fenceSync(context.SYNC_GPU_COMMANDS_COMPLETE, 0)! }
            : "link";
        context.flush();
      } else if (typeof p.stage === "object") {
        const c = context as WebGL2RenderingContext;
        // asked without waiting: the answer changes only between tasks
        if (c.getSyncParameter(p.stage.fence, c.SYNC_STATUS) === c.SIGNALED) {
          c.deleteSync(p.stage.fence);
          p.stage = "link";
        }
      } else {
        const step = PREPARED[p.stage];
        const stand = step.standIn ? standIn() : geometry;
        prepare(stand, step.points, step.axes);
        if (stand !== geometry) stand.dispose();
        p.stage = step.next;
      }
      invalidate();
      return;
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
    if (!p.fresh && p.drawnTo >= count) {
      p.sliceAt = 0;
      return;
    }
    // the time since the last slice's frame began is that frame's drawing and the wait for it
    const now = performance.now();
    if (p.sliceAt > 0) p.slice = nextSlice(p.slice, now - p.sliceAt);
    p.sliceAt = now;
    if (p.fresh) {
      // a kept drawing buffer is shown opaque here, so the picture is cleared to the colour behind it
      gl.setClearColor(new Color(backgroundBehind(gl.domElement)), 1);
      gl.clear();
    }
    p.fresh = false;
    const to = Math.min(count, p.drawnTo + p.slice);
    geometry.setDrawRange(p.drawnTo, to - p.drawnTo);
    gl.render(scene, camera);
    // a click looks for the point among all of them
    geometry.setDrawRange(0, Infinity);
    p.drawnTo = to;
    onDrawn(to);
    if (to < count) invalidate();
    else p.sliceAt = 0;
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
        gl={rendererInTwoTasks}
        camera={{ position: [2.2, 1.8, 2.6], fov: 40 }}
        raycaster={{
          params: { Points: { threshold: 0.02 }, Mesh: {}, Line: { threshold: 1 }, LOD: {}, Sprite: {} },
        }}
        data-testid="point-cloud"
      >
        <points name={POINTS_NAME} geometry={geometry} onClick={onClick}>
          <pointsMaterial size={3} sizeAttenuation={false} vertexColors />
        </points>
        <axesHelper name={AXES_NAME} args={[1.2]} />
        <OrbitControls makeDefault enableDamping={false} />
        <SlicedDrawing count={sample.drawn} onDrawn={onDrawn} />
      </Canvas>
    </>
  );
}
