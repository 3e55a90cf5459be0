import request from "supertest";
import { buildTestApp } from "./app";

const NO_ID = "00000000-0000-4000-8000-000000000000";

/**
 * Whether this build of the API has the review and records routes (issue 14). An unknown route
 * answers 404 `route_not_found` before anyone is asked to sign in; a known one answers 401 to a
 * visitor without a session. Browser tests of the review screens run only where it does.
 */
export async function serverHasReviewRoutes(): Promise<boolean> {
  const { app, close } = buildTestApp({ webDist: null });
  try {
    const answer = await request(app).get(`/api/workspaces/${NO_ID}/projects/${NO_ID}/review`);
    return !(answer.status === 404 && answer.body?.error?.id === "route_not_found");
  } finally {
    await close();
  }
}
