/**
 * Sigmacube core: the stress-tensor engine. Pure TypeScript, no DOM or Node APIs.
 *
 * Conventions: tension positive; shear components are tensor components (σxy = σyx), not
 * engineering strains; one consistent stress unit per call (core computes in whatever unit it is
 * given); principal stresses ordered σ1 ≥ σ2 ≥ σ3; angles in degrees at the API; the plane-stress
 * principal angle θp runs from the x axis to σ1, counter-clockwise positive, in (−90°, 90°]; a rotation
 * matrix's rows are the new axes written in the old frame, so σ' = R σ Rᵀ.
 *
 * Two layers: Float64Array batch kernels with caller-owned outputs (`principalBatch`,
 * `vonMisesBatch`), and the small object API below, built on the same kernels.
 *
 * Range and accuracy. Where stresses enter (the paste parser, the bench's cells, the API's stress
 * input) every component must be finite and at most `MAX_INPUT_STRESS` = 1e12 in magnitude, in the
 * unit it is written in; `convertStress` refuses NaN and any result that would overflow. Within that
 * range (and in fact for any finite tensor: the solver rescales before it squares) core promises, as
 * fractions of the tensor's Frobenius norm ‖σ‖F (`ACCURACY` in tolerances.ts, checked by the tests
 * against mathjs `eigs` on 10 000 seeded tensors and by property tests): each principal stress within
 * 1e-13·‖σ‖F of the exact one, a residual ‖σd − λd‖ ≤ 1e-12·‖σ‖F, and directions orthonormal to 1e-13.
 * The promise is absolute, not relative to each value: a principal stress much smaller than ‖σ‖F
 * (σ2 = 0.001 MPa beside σ1 = 1e9 MPa) carries the same absolute error, and a direction whose
 * principal stress is nearly repeated is defined only to about 1e-12·‖σ‖F divided by the gap.
 * The batch kernels never throw on a row that is not finite: its outputs are NaN and the returned
 * `BatchReport` counts and lists such rows.
 */

export type { StressTensor, Vec3, Mat3, Component } from "./tensor/types";
export { COMPONENTS } from "./tensor/types";
export type { Degrees, Radians } from "./units/angles";
export { deg, rad, degToRad, radToDeg } from "./units/angles";
export type { StressUnit } from "./units/stress";
export {
  STRESS_UNITS,
  PASCALS_PER_PSI,
  NEWTONS_PER_POUND_FORCE,
  METRES_PER_INCH,
  convertStress,
} from "./units/stress";
export {
  ACCURACY,
  HYDROSTATIC_DEVIATOR_REL,
  ROTATION_ORTHONORMAL_TOL,
  SYMMETRY_REL_TOL,
  TRIG_REFINE_THRESHOLD,
} from "./tolerances";

export type { Principal } from "./tensor/principal";
export { principalStresses, principalValues } from "./tensor/principal";
export type { Invariants } from "./tensor/invariants";
export {
  invariants,
  vonMises,
  tresca,
  maxShear,
  octahedral,
  lodeAngle,
  triaxiality,
} from "./tensor/invariants";
export { rotateTensor, rotationFromAxisAngle, rotationFromEuler } from "./tensor/rotate";
export { tractionOnPlane } from "./tensor/traction";
export type { MohrCircle } from "./plane/mohr";
export { mohrCircles } from "./plane/mohr";
export type { PlaneStressResult } from "./plane/plane-stress";
export { planeStress, transformPlaneStress } from "./plane/plane-stress";
export type { PlanePrincipal, PrincipalIndex } from "./plane/plane-principal";
export { planePrincipal, zIsPrincipal } from "./plane/plane-principal";
export type { Criterion, Material, MaterialBehaviour, StrengthKey } from "./criteria/safety-factor";
export {
  CRITERIA,
  safetyFactor,
  factorFromPrincipals,
  strengthsFor,
  modifiedMohrRefusal,
} from "./criteria/safety-factor";
export type {
  DecimalMark,
  ListingPoint,
  ParseError,
  ParseProblem,
  ParseTensorOptions,
  ParseTensorResult,
} from "./parse/parse-tensor";
export { COMMON_SIX_ORDERS, parseTensor } from "./parse/parse-tensor";
export { MAX_INPUT_STRESS, stressInputProblem } from "./tensor/validate";
export { FIRST_BAD_ROWS_LIMIT, principalBatch, vonMisesBatch } from "./batch/principal-batch";
export type { BatchReport, PrincipalBatchOutput } from "./batch/principal-batch";
export {
  IDENTITY_ROTATION,
  multiplyMat3,
  transposeMat3,
  orthonormalize,
  axisAngleFromRotation,
  eulerFromRotation,
  angleAboutZ,
  frameWithFirstAxis,
} from "./tensor/rotation-tools";
export { principalFrame, maxShearFrame } from "./frames/special-frames";
export { envelopeInPlane, envelopeHit } from "./criteria/envelope";
export type { PublishedMaterial } from "./materials/published";
export { PUBLISHED_MATERIALS, FROM_MEMORY_NOTE, publishedMaterial } from "./materials/published";

export type { CombinationTerm } from "./checks/combine";
export { combineLoadCases, combinePacked } from "./checks/combine";
export type {
  CriterionCheck,
  EvaluatedCheck,
  EvaluationOptions,
  EvaluationSpec,
  StateEvaluation,
} from "./checks/evaluate";
export { evaluateBatch, evaluateState, evaluateStates, moreCritical } from "./checks/evaluate";
export type { ComparisonRow, Governing } from "./checks/governing";
export { findGoverning, findOverallGoverning } from "./checks/governing";
export type { Allowables, CategoryFactors, CheckRequirement } from "./checks/requirements";
export { categoryKey, missingStrengths, requirementsFor } from "./checks/requirements";
export type { BehaviourFinding } from "./checks/applicability";
export {
  BRITTLE_CRITERIA,
  DUCTILE_CRITERIA,
  materialBehaviour,
  unsuitedReason,
} from "./checks/applicability";
export type { Verdict } from "./checks/verdict";
export {
  CLOSE_BAND,
  CLOSE_UTILISATION,
  EDGE_REL_TOL,
  utilisation,
  verdictForFactor,
  verdictForUtilisation,
} from "./checks/verdict";

export type {
  ThinWallForm,
  ThinWallRadial,
  ThinWallOptions,
  ThinWallStresses,
} from "./calculators/thin-wall";
export { thinCylinder, thinSphere } from "./calculators/thin-wall";
export type {
  Strain,
  PlaneStrain,
  GaugeReading,
  PrincipalStrains,
  ElasticConstants,
  StressFromStrain,
} from "./calculators/rosette";
export {
  MICROSTRAIN,
  strain,
  microstrain,
  toMicrostrain,
  correctForGaugeFactor,
  rectangularRosette,
  deltaRosette,
  threeGaugeRosette,
  transformStrain,
  principalStrains,
  stressFromStrain,
} from "./calculators/rosette";
export type { ShaftLoads, ShaftSurfaceStress } from "./calculators/shaft";
export { solidShaftStress } from "./calculators/shaft";
export type {
  CylinderEnds,
  ThickCylinderInput,
  ThickCylinderStresses,
  ThickSphereInput,
  ThickSphereStresses,
} from "./calculators/thick-wall";
export {
  DEFAULT_PROFILE_POINTS,
  thickCylinder,
  thickCylinderProfile,
  thickSphere,
  thickSphereProfile,
} from "./calculators/thick-wall";
export type { ThinWallAdequacy, VesselShape } from "./calculators/thin-wall-limit";
export { THIN_WALL_LIMIT, thinWallAdequacy } from "./calculators/thin-wall-limit";
export type {
  CombinedShaftLoads,
  CombinedShaftStress,
  ShaftKt,
  ShaftNominalStresses,
  ShaftPointStress,
  ShaftSection,
  ShaftSectionProperties,
  ShaftSurface,
  ShaftSurfacePoint,
} from "./calculators/combined-shaft";
export { bendingTowards, hollowShaftStress } from "./calculators/combined-shaft";
export type { Ug27Formula, Ug27Input, Ug27Result, Ug27Shape } from "./calculators/asme-ug27";
export { ug27RequiredThickness } from "./calculators/asme-ug27";

export type { EnvelopeProbe, EnvelopeProbeHit } from "./criteria/envelope-probe";
export { probeEnvelopes } from "./criteria/envelope-probe";

export type {
  AtEnds,
  BendingRule,
  EquivalentCriterion,
  LineClassification,
  LinearizationAllowables,
  LinearizationCheck,
  LinearizationCheckId,
  LinearizationInput,
  LinearizationResult,
  ScalarAtEnds,
} from "./linearization/types";
export { linearize, ANNEX_5A_BENT_COMPONENTS, ALL_COMPONENTS } from "./linearization/linearize";
export { MIN_POINTS, RECOMMENDED_MIN_POINTS, OFF_LINE_WARN_FRACTION } from "./linearization/path";
export { spsLimit, SPS_YIELD_TO_ULTIMATE_LIMIT } from "./linearization/category-checks";
export { pickPath, pointsNearSegment, COINCIDENT_FRACTION, type PickedPath } from "./linearization/pick-path";

// Finite-element point tables: a chunked delimited-text parser into Float64Arrays and a chunked
// evaluator over the batch kernels (see core/point-tables/).
export * from "./point-tables/index";
