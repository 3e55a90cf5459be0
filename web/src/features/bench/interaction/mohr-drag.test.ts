import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planeStress, rotateTensor, rotationFromAxisAngle, transformPlaneStress } from "../../../../../core";
import { beginMohrDrag, moveMohrDrag, mohrDragTheta, screenAngle, type DiagramPoint } from "./mohr-drag";

/** The x′ face point at angle θ, as the diagram plots it (σx′, τx′y′). */
function facePoint(sx: number, sy: number, txy: number, theta: number): DiagramPoint {
  const t = transformPlaneStress(sx, sy, txy, theta);
  return { sigma: t.sx, tau: t.txy };
}

/** A point on the circle at a screen angle φ (counter-clockwise), with τ plotted downward. */
function atScreenAngle(center: number, radius: number, phiDeg: number): DiagramPoint {
  const p = (phiDeg * Math.PI) / 180;
  return { sigma: center + radius * Math.cos(p), tau: -radius * Math.sin(p) };
}

const stress = fc.double({ min: -300, max: 300, noNaN: true });

describe("dragging the x′ point round the plane-stress Mohr circle", () => {
  it("when the point is dragged counter-clockwise on screen by Δ, then the element turns counter-clockwise about z by Δ/2 and the x′ point lands under the pointer (double-angle property of Mohr's circle, Gere & Goodno)", () => {
    fc.assert(
      fc.property(
        stress,
        stress,
        stress,
        fc.double({ min: -89, max: 89, noNaN: true }),
        fc.double({ min: -170, max: 170, noNaN: true }),
        (sx, sy, txy, theta0, delta) => {
          const c = planeStress(sx, sy, txy);
          fc.pre(c.radius > 1 && Math.abs(delta) > 1e-3);
          const start = facePoint(sx, sy, txy, theta0);
          let drag = beginMohrDrag(start, theta0, c.center);
          const phi0 = screenAngle(start, c.center);
          // Move in ten steps along the circle, as a pointer would.
          for (let k = 1; k <= 10; k++)
            drag = moveMohrDrag(drag, atScreenAngle(c.center, c.radius, phi0 + (delta * k) / 10));
          const theta = mohrDragTheta(drag)!;
          const turned = ((theta - theta0 + 540) % 360) - 180;
          expect(turned).toBeCloseTo(delta / 2, 8);
          // Counter-clockwise drag (Δ > 0) ⇒ θ grows ⇒ x′ = (cos θ, sin θ, 0) turns counter-clockwise from x towards y.
          if (delta > 0) expect(turned).toBeGreaterThan(0);
          const landed = facePoint(sx, sy, txy, theta);
          const pointer = atScreenAngle(c.center, c.radius, phi0 + delta);
          expect(landed.sigma).toBeCloseTo(pointer.sigma, 6);
          expect(landed.tau).toBeCloseTo(pointer.tau, 6);
          // The 3D readout after the drag agrees with the plane-stress transformation.
          const r = rotateTensor(
            { xx: sx, yy: sy, zz: 0, xy: txy, yz: 0, zx: 0 },
            rotationFromAxisAngle([0, 0, 1], theta),
          );
          expect(r.xx).toBeCloseTo(landed.sigma, 6);
          expect(r.xy).toBeCloseTo(landed.tau, 6);
        },
      ),
      { seed: 11, numRuns: 300 },
    );
  });

  it("when the pointer goes once fully round the circle, then the element turns by 180° (the sweep is unwrapped)", () => {
    let drag = beginMohrDrag(atScreenAngle(0, 10, 0), 0, 0);
    for (let k = 1; k <= 36; k++) drag = moveMohrDrag(drag, atScreenAngle(0, 10, k * 10));
    expect(drag.dragging && drag.swept).toBeCloseTo(360, 10);
    expect(Math.abs(mohrDragTheta(drag)!)).toBeCloseTo(180, 10);
  });

  it("when σx = 80, σy = −40, τxy = 30 and the element stands at θp, then the x′ point is at σ1 on the axis (Gere & Goodno)", () => {
    const c = planeStress(80, -40, 30);
    const p = facePoint(80, -40, 30, c.thetaP);
    expect(p.sigma).toBeCloseTo(c.s1, 10);
    expect(p.tau).toBeCloseTo(0, 10);
    expect(screenAngle(p, c.center)).toBeCloseTo(0, 8);
  });
});
