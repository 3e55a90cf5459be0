/**
 * The 3D scatter's chunk (three.js and react-three-fiber). The page starts loading it when it
 * opens, so its download and the evaluation of its script (a long main-thread task) happen while
 * the engineer maps columns, not at the moment the results appear.
 */
export const loadPointCloud = () => import("./PointCloud");
