/** A classification line the API tests send: one known distribution with results easy to check by hand. */

/**
 * A linear hoop stress σyy = 200 − 20·d MPa (d in mm) through a 10 mm wall, at 11 evenly spaced
 * points, the line along the global x axis. A linear distribution is split exactly into membrane
 * (its mean, 100 MPa) and bending (±100 MPa at the surfaces) with no peak (common practice, no
 * source: the membrane is the mean and the bending the linear part of a distribution).
 */
export function linearWall(locationId: string | null, name = "Nozzle junction, inside to outside") {
  return {
    name,
    locationId,
    path: {
      positions: "distance",
      lengthUnit: "mm",
      stressUnit: "MPa",
      lineDirection: [1, 0, 0],
      points: Array.from({ length: 11 }, (_, i) => ({
        distance: i,
        xx: -1,
        yy: 200 - 20 * i,
        zz: 50,
        xy: 0,
        yz: 0,
        zx: 0,
      })),
    },
    secondAxis: [0, 1, 0],
    classification: { membrane: "local", stresses: "primary" },
    allowables: { source: "typed", S: 138 },
  };
}
