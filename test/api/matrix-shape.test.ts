import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildTestApp } from "../support/app";
import { projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

// Item 6 of issue 10: a stress matrix of the wrong shape reached the symmetry check, which read
// rows that were not there and threw (500). Now the shape is reported and the check is skipped.
const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let projectId: string;
let location: string;
const casesPath = () => wsPath(team, `/projects/${projectId}/load-cases`);

beforeAll(async () => {
  team = await projectTeam(app);
  ({
    projectId,
    locationIds: [location],
  } = await projectWithLocations(team, { name: "Matrix shapes" }, ["nozzle"]));
});

const badShapes: [string, unknown, string][] = [
  ["no rows", [], "stress.matrix"],
  ["one row", [[1, 2, 3]], "stress.matrix"],
  [
    "two rows",
    [
      [1, 2, 3],
      [2, 1, 0],
    ],
    "stress.matrix",
  ],
  [
    "four rows",
    [
      [1, 2, 3],
      [2, 1, 0],
      [3, 0, 1],
      [0, 0, 0],
    ],
    "stress.matrix",
  ],
  [
    "rows of two",
    [
      [1, 2],
      [2, 1],
      [0, 0],
    ],
    "stress.matrix.0",
  ],
  ["a missing row", [[1, 2, 3], [2, 1, 0], null], "stress.matrix.2"],
];

describe("stress matrices of the wrong shape", () => {
  for (const [label, matrix, path] of badShapes) {
    it(`when a new case's state has a matrix with ${label}, then 400 names states.0.${path}`, async () => {
      const response = await team.editor.agent.post(casesPath()).send({
        name: `Shape ${label}`,
        states: [{ locationId: location, stress: { unit: "MPa", matrix } }],
      });
      expect(response.status, JSON.stringify(response.body)).toBe(400);
      expect(response.body.error.id).toBe("invalid_input");
      expect(response.body.error.details).toContainEqual(
        expect.objectContaining({ path: `states.0.${path}` }),
      );
      // The shape is the problem; no symmetry complaint about entries that do not exist.
      for (const detail of response.body.error.details as { message: string }[]) {
        expect(detail.message).not.toMatch(/symmetric/);
      }
    });
  }

  it("when a saved state is replaced by a matrix with one row, then 400 names stress.matrix and the state is kept", async () => {
    const created = await team.editor.agent.post(casesPath()).send({
      name: "Kept",
      states: [
        {
          locationId: location,
          stress: {
            unit: "MPa",
            matrix: [
              [10, 2, 0],
              [2, 5, 0],
              [0, 0, 0],
            ],
          },
        },
      ],
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const caseId = created.body.loadCase.id as string;
    const response = await team.editor.agent
      .put(`${casesPath()}/${caseId}/states/${location}`)
      .send({ version: created.body.loadCase.version, stress: { unit: "MPa", matrix: [[1, 2, 3]] } });
    expect(response.status, JSON.stringify(response.body)).toBe(400);
    expect(response.body.error.details).toContainEqual(expect.objectContaining({ path: "stress.matrix" }));
    const read = await team.editor.agent.get(`${casesPath()}/${caseId}`).expect(200);
    expect(read.body.loadCase.states[0].components).toMatchObject({ xx: 10, yy: 5, xy: 2 });
  });

  it("when the matrix is 3×3 but not symmetric, then the symmetry check still speaks", async () => {
    const response = await team.editor.agent.post(casesPath()).send({
      name: "Asymmetric",
      states: [
        {
          locationId: location,
          stress: {
            unit: "MPa",
            matrix: [
              [1, 2, 0],
              [5, 1, 0],
              [0, 0, 1],
            ],
          },
        },
      ],
    });
    expect(response.status).toBe(400);
    expect(response.body.error.details).toContainEqual(
      expect.objectContaining({
        path: "states.0.stress.matrix.0.1",
        message: expect.stringMatching(/symmetric/),
      }),
    );
  });
});
