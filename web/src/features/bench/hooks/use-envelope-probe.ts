/**
 * The envelope plot's probe: the point under the pointer, or moved with the keys while the plot
 * has focus (interaction/envelope-probe.ts), in the bench unit.
 */
import { useState, type FocusEvent, type KeyboardEvent, type PointerEvent, type RefObject } from "react";
import { onEnvelopePlot, type EnvelopeGeometry } from "../../../../../core/diagrams";
import { probeAfterKey, probeStart, type Probe } from "../interaction/envelope-probe";

export function useEnvelopeProbe({
  svg,
  geometry,
  state,
}: {
  svg: RefObject<SVGSVGElement | null>;
  geometry: Pick<EnvelopeGeometry, "plot" | "x" | "y" | "extent">;
  state: readonly [number, number] | null;
}) {
  const [probe, setProbe] = useState<Probe>(null);

  function onPointerMove(event: PointerEvent<SVGSVGElement>) {
    const el = svg.current!;
    const pt = el.createSVGPoint();
    pt.x = event.clientX;
    pt.y = event.clientY;
    const local = pt.matrixTransform(el.getScreenCTM()!.inverse());
    setProbe(
      onEnvelopePlot(geometry, local.x, local.y)
        ? [geometry.x.invert(local.x), geometry.y.invert(local.y)]
        : null,
    );
  }

  function onKeyDown(event: KeyboardEvent<SVGSVGElement>) {
    const next = probeAfterKey(probe, event.key, event.shiftKey, geometry.extent, state);
    if (next === undefined) return;
    setProbe(next);
    event.preventDefault();
  }

  function onFocus(event: FocusEvent<SVGSVGElement>) {
    // Keyboard users start the probe on the state (or the origin).
    if (event.target === svg.current && probe === null) setProbe(probeStart(state));
  }

  return {
    probe,
    handlers: {
      onPointerMove,
      onPointerLeave: () => setProbe(null),
      onKeyDown,
      onFocus,
      onBlur: () => setProbe(null),
    },
  };
}
