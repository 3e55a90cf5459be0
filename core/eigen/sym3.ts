import { HYDROSTATIC_DEVIATOR_REL, TRIG_REFINE_THRESHOLD } from "../tolerances";

// Cubic fit of 2cos(acos(r)/3) in s = √((1 + r)/2) on r ∈ [0, 1] (max error 8.5e-7); two Newton
// steps on x³ − 3x − 2r then reach full precision (checked against the trigonometric form).
const F0 = 1.0059897783774554;
const F1 = 1.122645530019404;
const F2 = -0.15220035432435405;
const F3 = 0.023565839423369237;

/**
 * Largest root of x³ − 3x − 2r = 0 for r ∈ [0, 1], i.e. 2cos(acos(r)/3), in [√3, 2]; the root there
 * is simple (derivative 3x² − 3 ≥ 6), so Newton converges quadratically from the fitted start.
 * @param r cos 3φ, dimensionless, in [0, 1]
 */
function farRoot(r: number): number {
  const s = Math.sqrt(0.5 + 0.5 * r);
  let x = F0 + s * (F1 + s * (F2 + s * F3));
  let x2 = x * x;
  x -= (x * x2 - 3 * x - 2 * r) / (3 * x2 - 3);
  x2 = x * x;
  x -= (x * x2 - 3 * x - 2 * r) / (3 * x2 - 3);
  return x;
}

/**
 * Eigenvalues (and optionally eigenvectors) of one symmetric 3×3 matrix, written into caller-owned
 * arrays; allocates nothing. This is the kernel behind `principalStresses` and `principalBatch`.
 *
 * Method: the matrix is divided by its largest absolute entry, its deviator by the deviator's largest
 * entry (so neither 0, 1e-300 nor 1e200 can underflow or overflow). With p = √(j2/3) and
 * r = det(D/p)/2 = cos 3φ, the eigenvalues of D/p are the roots of x³ − 3x − 2r = 0 (the
 * trigonometric solution 2cos(φ + 2πk/3)). The root farthest from the other two (σ1 when r ≥ 0, else
 * σ3) is simple and well conditioned; it is found by two Newton steps from a fitted start. Its
 * eigenvector is the longest cross product of two rows of (D − λI). The other two eigenpairs come
 * from the exact 2×2 problem in the plane orthogonal to it (one Jacobi rotation), so repeated and
 * nearly repeated roots keep full accuracy and the three vectors are orthonormal to rounding. Without
 * vectors, the pair comes straight from the cubic's remaining quadratic unless |r| >
 * {@link TRIG_REFINE_THRESHOLD} (a nearly repeated pair, where that loses digits).
 *
 * Output: values σ1 ≥ σ2 ≥ σ3 at `values[vo..vo+2]`; if `vecs` is given, unit directions d1, d2, d3 at
 * `vecs[dvo..dvo+8]`, right-handed (d3 = d1 × d2), each of d1 and d2 signed so that its component of
 * largest magnitude is positive. A hydrostatic (or zero) tensor gives the x, y, z axes.
 *
 * @param inp components xx yy zz xy yz zx (stress, any one unit) at `inp[io..io+5]`
 * @param io offset of the tensor in `inp`
 * @param values output for the three principal stresses (same unit as the input)
 * @param vo offset in `values`
 * @param vecs output for the three unit directions (dimensionless), or null to skip them
 * @param dvo offset in `vecs`
 * @returns false (and writes nothing) when a component is NaN or ±Infinity
 *
 * One long function on purpose: every intermediate stays in a local variable, where helpers would
 * need arrays or objects to hand a dozen values between them, and the kernel allocates nothing.
 */
export function eigSym3(
  inp: Float64Array,
  io: number,
  values: Float64Array,
  vo: number,
  vecs: Float64Array | null,
  dvo: number,
): boolean {
  let a00 = inp[io];
  let a11 = inp[io + 1];
  let a22 = inp[io + 2];
  let a01 = inp[io + 3];
  let a12 = inp[io + 4];
  let a02 = inp[io + 5];
  let amax = Math.abs(a00);
  let t = Math.abs(a11);
  if (t > amax) amax = t;
  t = Math.abs(a22);
  if (t > amax) amax = t;
  t = Math.abs(a01);
  if (t > amax) amax = t;
  t = Math.abs(a12);
  if (t > amax) amax = t;
  t = Math.abs(a02);
  if (t > amax) amax = t;
  // 0·x is NaN exactly when x is NaN or ±Infinity (NaN also escapes the comparisons above)
  t = 0 * a00 + 0 * a11 + 0 * a22 + 0 * a01 + 0 * a12 + 0 * a02;
  if (t !== 0) return false;
  if (amax === 0) {
    values[vo] = 0;
    values[vo + 1] = 0;
    values[vo + 2] = 0;
    if (vecs !== null) writeIdentity(vecs, dvo);
    return true;
  }
  a00 /= amax;
  a11 /= amax;
  a22 /= amax;
  a01 /= amax;
  a12 /= amax;
  a02 /= amax;
  const m = (a00 + a11 + a22) / 3;
  let d00 = a00 - m;
  let d11 = a11 - m;
  let d22 = a22 - m;
  let d01 = a01;
  let d12 = a12;
  let d02 = a02;
  let dmax = Math.abs(d00);
  t = Math.abs(d11);
  if (t > dmax) dmax = t;
  t = Math.abs(d22);
  if (t > dmax) dmax = t;
  t = Math.abs(d01);
  if (t > dmax) dmax = t;
  t = Math.abs(d12);
  if (t > dmax) dmax = t;
  t = Math.abs(d02);
  if (t > dmax) dmax = t;
  if (dmax <= HYDROSTATIC_DEVIATOR_REL) {
    const h = m * amax;
    values[vo] = h;
    values[vo + 1] = h;
    values[vo + 2] = h;
    if (vecs !== null) writeIdentity(vecs, dvo);
    return true;
  }
  const inv = 1 / dmax;
  d00 *= inv;
  d11 *= inv;
  d22 *= inv;
  d01 *= inv;
  d12 *= inv;
  d02 *= inv;

  // Closed form on the normalised deviator D: eigenvalues 2p·cos(φ + 2πk/3), cos 3φ = det(D/p)/2.
  const p2 = (d00 * d00 + d11 * d11 + d22 * d22) / 6 + (d01 * d01 + d12 * d12 + d02 * d02) / 3;
  const p = Math.sqrt(p2);
  const det = d00 * (d11 * d22 - d12 * d12) - d01 * (d01 * d22 - d12 * d02) + d02 * (d01 * d12 - d11 * d02);
  let r = det / (2 * p * p2);
  if (r > 1) r = 1;
  else if (r < -1) r = -1;
  // Roots of x³ − 3x − 2r = 0 are the eigenvalues of D/p. The far root (x1 for r ≥ 0, x3 for r < 0)
  // comes from farRoot(|r|); the pair from the remaining quadratic x² + xf·x + (xf² − 3) = 0.
  const topIsFar = r >= 0;
  const xf = topIsFar ? farRoot(r) : -farRoot(-r);
  const far = p * xf;

  if (vecs === null && r <= TRIG_REFINE_THRESHOLD && r >= -TRIG_REFINE_THRESHOLD) {
    let disc = 12 - 3 * xf * xf;
    if (disc < 0) disc = 0;
    const q = Math.sqrt(disc);
    const hiPair = p * 0.5 * (q - xf);
    const loPair = p * -0.5 * (q + xf);
    const l1 = topIsFar ? far : hiPair;
    const l2 = topIsFar ? hiPair : loPair;
    const l3 = topIsFar ? loPair : far;
    values[vo] = amax * (m + dmax * l1);
    values[vo + 1] = amax * (m + dmax * l2);
    values[vo + 2] = amax * (m + dmax * l3);
    return true;
  }

  // The root far from the other two (σ1 when r ≥ 0, else σ3) and its eigenvector: the null vector of
  // B = D − far·I, taken as the longest cross product of two rows of B.
  const b00 = d00 - far;
  const b11 = d11 - far;
  const b22 = d22 - far;
  // r0 × r1
  let v0 = d01 * d12 - d02 * b11;
  let v1 = d02 * d01 - b00 * d12;
  let v2 = b00 * b11 - d01 * d01;
  let vn = v0 * v0 + v1 * v1 + v2 * v2;
  // r0 × r2
  let x0 = d01 * b22 - d02 * d12;
  let x1 = d02 * d02 - b00 * b22;
  let x2 = b00 * d12 - d01 * d02;
  let xn = x0 * x0 + x1 * x1 + x2 * x2;
  if (xn > vn) {
    v0 = x0;
    v1 = x1;
    v2 = x2;
    vn = xn;
  }
  // r1 × r2
  x0 = b11 * b22 - d12 * d12;
  x1 = d12 * d02 - d01 * b22;
  x2 = d01 * d12 - b11 * d02;
  xn = x0 * x0 + x1 * x1 + x2 * x2;
  if (xn > vn) {
    v0 = x0;
    v1 = x1;
    v2 = x2;
    vn = xn;
  }
  t = 1 / Math.sqrt(vn);
  v0 *= t;
  v1 *= t;
  v2 *= t;

  // Orthonormal basis (u, w) of the plane orthogonal to v.
  let u0: number, u1: number, u2: number;
  if (Math.abs(v0) > Math.abs(v1)) {
    t = 1 / Math.sqrt(v0 * v0 + v2 * v2);
    u0 = -v2 * t;
    u1 = 0;
    u2 = v0 * t;
  } else {
    t = 1 / Math.sqrt(v1 * v1 + v2 * v2);
    u0 = 0;
    u1 = v2 * t;
    u2 = -v1 * t;
  }
  const w0 = v1 * u2 - v2 * u1;
  const w1 = v2 * u0 - v0 * u2;
  const w2 = v0 * u1 - v1 * u0;

  // 2×2 block M = [u w]ᵀ D [u w], diagonalised by one Jacobi rotation.
  const du0 = d00 * u0 + d01 * u1 + d02 * u2;
  const du1 = d01 * u0 + d11 * u1 + d12 * u2;
  const du2 = d02 * u0 + d12 * u1 + d22 * u2;
  const m00 = u0 * du0 + u1 * du1 + u2 * du2;
  const m01 = w0 * du0 + w1 * du1 + w2 * du2;
  const m11 =
    w0 * (d00 * w0 + d01 * w1 + d02 * w2) +
    w1 * (d01 * w0 + d11 * w1 + d12 * w2) +
    w2 * (d02 * w0 + d12 * w1 + d22 * w2);
  let cr = 1;
  let sr = 0;
  let ea = m00;
  let eb = m11;
  if (m01 !== 0) {
    const tau = (m11 - m00) / (2 * m01);
    let tr = 1 / (Math.abs(tau) + Math.sqrt(1 + tau * tau));
    if (tau < 0) tr = -tr;
    cr = 1 / Math.sqrt(1 + tr * tr);
    sr = tr * cr;
    ea = m00 - tr * m01;
    eb = m11 + tr * m01;
  }
  // Eigenvectors of the pair: a = cr·u − sr·w (value ea), b = sr·u + cr·w (value eb).
  let swap = eb > ea;
  const hi = swap ? eb : ea;
  const lo = swap ? ea : eb;
  let l1: number, l2: number, l3: number;
  if (topIsFar) {
    l1 = far;
    l2 = hi;
    l3 = lo;
  } else {
    l1 = hi;
    l2 = lo;
    l3 = far;
  }
  values[vo] = amax * (m + dmax * l1);
  values[vo + 1] = amax * (m + dmax * l2);
  values[vo + 2] = amax * (m + dmax * l3);
  if (vecs === null) return true;

  const a0 = cr * u0 - sr * w0;
  const a1 = cr * u1 - sr * w1;
  const a2 = cr * u2 - sr * w2;
  const e0 = sr * u0 + cr * w0;
  const e1 = sr * u1 + cr * w1;
  const e2 = sr * u2 + cr * w2;
  let h0: number, h1: number, h2: number, g0: number, g1: number, g2: number;
  if (swap) {
    h0 = e0;
    h1 = e1;
    h2 = e2;
    g0 = a0;
    g1 = a1;
    g2 = a2;
  } else {
    h0 = a0;
    h1 = a1;
    h2 = a2;
    g0 = e0;
    g1 = e1;
    g2 = e2;
  }
  // Order (d1, d2, d3) and the two that fix the signs.
  let p0: number,
    p1: number,
    pz: number,
    q0: number,
    q1: number,
    q2: number,
    z0: number,
    z1: number,
    z2: number;
  if (topIsFar) {
    p0 = v0;
    p1 = v1;
    pz = v2;
    q0 = h0;
    q1 = h1;
    q2 = h2;
    z0 = g0;
    z1 = g1;
    z2 = g2;
  } else {
    p0 = h0;
    p1 = h1;
    pz = h2;
    q0 = g0;
    q1 = g1;
    q2 = g2;
    z0 = v0;
    z1 = v1;
    z2 = v2;
  }
  if (largestIsNegative(p0, p1, pz)) {
    p0 = -p0;
    p1 = -p1;
    pz = -pz;
  }
  if (largestIsNegative(q0, q1, q2)) {
    q0 = -q0;
    q1 = -q1;
    q2 = -q2;
  }
  // Right-handed: d3 must point along d1 × d2.
  swap = (p1 * q2 - pz * q1) * z0 + (pz * q0 - p0 * q2) * z1 + (p0 * q1 - p1 * q0) * z2 < 0;
  if (swap) {
    z0 = -z0;
    z1 = -z1;
    z2 = -z2;
  }
  vecs[dvo] = p0;
  vecs[dvo + 1] = p1;
  vecs[dvo + 2] = pz;
  vecs[dvo + 3] = q0;
  vecs[dvo + 4] = q1;
  vecs[dvo + 5] = q2;
  vecs[dvo + 6] = z0;
  vecs[dvo + 7] = z1;
  vecs[dvo + 8] = z2;
  return true;
}

function largestIsNegative(x: number, y: number, z: number): boolean {
  const ax = Math.abs(x);
  const ay = Math.abs(y);
  const az = Math.abs(z);
  if (ax >= ay && ax >= az) return x < 0;
  if (ay >= az) return y < 0;
  return z < 0;
}

function writeIdentity(vecs: Float64Array, o: number): void {
  vecs[o] = 1;
  vecs[o + 1] = 0;
  vecs[o + 2] = 0;
  vecs[o + 3] = 0;
  vecs[o + 4] = 1;
  vecs[o + 5] = 0;
  vecs[o + 6] = 0;
  vecs[o + 7] = 0;
  vecs[o + 8] = 1;
}

/**
 * Von Mises equivalent stress of one tensor, √(½[(σxx−σyy)² + (σyy−σzz)² + (σzz−σxx)²] + 3(σxy² + σyz² + σzx²)).
 * Rescales only when the plain sum of squares could have underflowed or overflowed.
 * @param xx normal stress (any one stress unit) @param yy normal stress @param zz normal stress
 * @param xy tensor shear stress @param yz tensor shear stress @param zx tensor shear stress
 * @returns the equivalent stress (same unit), or NaN if a component is not finite
 */
export function vonMisesOf(xx: number, yy: number, zz: number, xy: number, yz: number, zx: number): number {
  const a = xx - yy;
  const b = yy - zz;
  const c = zz - xx;
  const q = 0.5 * (a * a + b * b + c * c) + 3 * (xy * xy + yz * yz + zx * zx);
  if (q >= 1e-290 && q <= 1e290) return Math.sqrt(q);
  return vonMisesScaled(xx, yy, zz, xy, yz, zx);
}

function vonMisesScaled(xx: number, yy: number, zz: number, xy: number, yz: number, zx: number): number {
  const k = Math.max(Math.abs(xx), Math.abs(yy), Math.abs(zz), Math.abs(xy), Math.abs(yz), Math.abs(zx));
  if (!(k <= Number.MAX_VALUE)) return NaN;
  if (k === 0) return 0;
  const a = xx / k - yy / k;
  const b = yy / k - zz / k;
  const c = zz / k - xx / k;
  const e = xy / k;
  const f = yz / k;
  const g = zx / k;
  return k * Math.sqrt(0.5 * (a * a + b * b + c * c) + 3 * (e * e + f * f + g * g));
}
