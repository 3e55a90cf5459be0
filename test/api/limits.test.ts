import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PROJECT_LIMITS } from "../../core/contract/limits";
import { PROJECT_EXPORT_FORMAT, PROJECT_EXPORT_SCHEMA_VERSION } from "../../core/contract/project-export";
import { Combination } from "../../db/models/combination";
import { LoadCase } from "../../db/models/load-case";
import { Location } from "../../db/models/location";
import { Project } from "../../db/models/project";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;

beforeAll(async () => {
  team = await projectTeam(app);
});

/** A project with `n` rows of `model` written straight to the database (the API would take minutes). */
async function projectWith(kind: "locations" | "loadCases" | "combinations", n: number) {
  const { projectId, locationIds } = await projectWithLocations(team, { name: `Limits ${kind}` }, ["first"]);
  const base = { projectId, description: "", createdBy: team.editor.user.id, updatedBy: team.editor.user.id };
  const rows = Array.from({ length: n }, (_, i) => ({ ...base, name: `${kind} ${i}`, position: i + 1 }));
  if (kind === "locations") await Location.bulkCreate(rows.slice(1).map((r) => ({ ...r, note: "" })));
  if (kind === "loadCases") await LoadCase.bulkCreate(rows.map((r) => ({ ...r, category: "" })));
  if (kind === "combinations") await Combination.bulkCreate(rows);
  return { base: wsPath(team, `/projects/${projectId}`), locationId: locationIds[0] };
}

/** A valid export file with `locations` locations, one case and `combinations` combinations of `terms` terms each. */
function exportFile(name: string, size: { locations: number; combinations: number; terms: number }) {
  const cases = Array.from({ length: Math.max(1, size.terms) }, (_, i) => ({
    key: `c${i}`,
    name: `case ${i}`,
    category: "",
    description: "",
    states: [],
  }));
  return {
    format: PROJECT_EXPORT_FORMAT,
    schemaVersion: PROJECT_EXPORT_SCHEMA_VERSION,
    exportedAt: new Date().toISOString(),
    project: {
      name,
      description: "",
      unitSystem: "SI",
      requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
      categoryRequirements: [],
      includeUnsuitedCriteria: false,
      defaultMaterial: null,
    },
    materials: [],
    locations: Array.from({ length: size.locations }, (_, i) => ({
      key: `l${i}`,
      name: `point ${i}`,
      note: "",
      material: null,
    })),
    loadCases: cases,
    combinations: Array.from({ length: size.combinations }, (_, i) => ({
      name: `combination ${i}`,
      description: "",
      terms: cases.slice(0, size.terms).map((c) => ({ loadCase: c.key, factor: 1 })),
    })),
  };
}

const expectLimit = (
  body: { error: { id: string; message: string; details: { limit: string; path: string } } },
  limit: keyof typeof PROJECT_LIMITS,
  path: string,
) => {
  expect(body.error.id).toBe("project_limit");
  expect(body.error.message).toContain(`at most ${PROJECT_LIMITS[limit]}`);
  expect(body.error.details).toMatchObject({ limit, max: PROJECT_LIMITS[limit], path });
};

describe("project limits on create", () => {
  it("when a project holds one location fewer than the limit, then one more is created and the next is refused with a 400 naming the limit", async () => {
    const { base } = await projectWith("locations", PROJECT_LIMITS.locations - 1);
    await team.editor.agent.post(`${base}/locations`).send({ name: "the last one allowed" }).expect(201);
    const refused = await team.editor.agent.post(`${base}/locations`).send({ name: "one too many" });
    expect(refused.status).toBe(400);
    expectLimit(refused.body, "locations", "locations");
    const projectId = base.split("/").pop()!;
    expect(await Location.count({ where: { projectId, deletedAt: null } })).toBe(PROJECT_LIMITS.locations);
  });

  it("when a project holds as many load cases as the limit, then another is refused with a 400 naming the limit and nothing is written", async () => {
    const { base, locationId } = await projectWith("loadCases", PROJECT_LIMITS.loadCases);
    const refused = await team.editor.agent
      .post(`${base}/load-cases`)
      .send({ name: "one too many", states: [{ locationId, stress: mpa(1, 0) }] });
    expect(refused.status).toBe(400);
    expectLimit(refused.body, "loadCases", "loadCases");
    const projectId = base.split("/").pop()!;
    expect(await LoadCase.count({ where: { projectId } })).toBe(PROJECT_LIMITS.loadCases);
  });

  it("when a project holds as many combinations as the limit, then another is refused with a 400 naming the limit", async () => {
    const { base, locationId } = await projectWith("combinations", PROJECT_LIMITS.combinations);
    const c = await team.editor.agent
      .post(`${base}/load-cases`)
      .send({ name: "dead", states: [{ locationId, stress: mpa(1, 0) }] })
      .expect(201);
    const refused = await team.editor.agent
      .post(`${base}/combinations`)
      .send({ name: "one too many", terms: [{ loadCaseId: c.body.loadCase.id, factor: 1 }] });
    expect(refused.status).toBe(400);
    expectLimit(refused.body, "combinations", "combinations");
  });

  it("when a combination has one term more than the limit, then it is refused with a 400 that names the terms field and the limit", async () => {
    const { base } = await projectWith("combinations", 0);
    const terms = Array.from({ length: PROJECT_LIMITS.termsPerCombination + 1 }, () => ({
      loadCaseId: randomUUID(),
      factor: 1,
    }));
    const refused = await team.editor.agent.post(`${base}/combinations`).send({ name: "too long", terms });
    expect(refused.status).toBe(400);
    const detail = refused.body.error.details.find((d: { path: string }) => d.path === "terms");
    expect(detail.message).toContain(`at most ${PROJECT_LIMITS.termsPerCombination} terms`);
  });
});

describe("project limits on restore", () => {
  it("when a project is full and one of its locations comes back from the trash, then the restore is refused with a 400 naming the limit and the location stays in the trash", async () => {
    const { base } = await projectWith("locations", PROJECT_LIMITS.locations);
    const projectId = base.split("/").pop()!;
    const trashed = await Location.create({
      projectId,
      name: "in the trash",
      note: "",
      position: 999,
      deletedAt: new Date(),
      deletedBy: team.editor.user.id,
    });
    const refused = await team.editor.agent.post(wsPath(team, `/trash/location/${trashed.id}/restore`));
    expect(refused.status).toBe(400);
    expectLimit(refused.body, "locations", "itemId");
    await trashed.reload();
    expect(trashed.deletedAt).not.toBeNull();
  });
});

describe("project limits on import", () => {
  it("when a file holds as many locations and combinations as the limits allow, then it is imported", async () => {
    const name = `At the limits ${randomUUID()}`;
    const file = exportFile(name, {
      locations: PROJECT_LIMITS.locations,
      combinations: PROJECT_LIMITS.combinations,
      terms: PROJECT_LIMITS.termsPerCombination,
    });
    const response = await team.editor.agent.post(wsPath(team, "/project-imports")).send(file);
    expect(response.status, JSON.stringify(response.body).slice(0, 400)).toBe(201);
    expect(response.body.counts).toMatchObject({
      locations: PROJECT_LIMITS.locations,
      combinations: PROJECT_LIMITS.combinations,
    });
  });

  it.each([
    [
      "locations",
      { locations: PROJECT_LIMITS.locations + 1, combinations: 1, terms: 1 },
      "locations",
      "locations",
    ],
    [
      "combinations",
      { locations: 1, combinations: PROJECT_LIMITS.combinations + 1, terms: 1 },
      "combinations",
      "combinations",
    ],
    [
      "termsPerCombination",
      { locations: 1, combinations: 1, terms: PROJECT_LIMITS.termsPerCombination + 1 },
      "termsPerCombination",
      "combinations.0.terms",
    ],
  ] as const)(
    "when a file goes one past the %s limit, then it is refused with a 400 naming the limit and no project is written",
    async (_label, size, limit, path) => {
      const name = `Past the limit ${randomUUID()}`;
      const response = await team.editor.agent
        .post(wsPath(team, "/project-imports"))
        .send(exportFile(name, size));
      expect(response.status).toBe(400);
      expectLimit(response.body, limit, path);
      expect(await Project.count({ where: { name } })).toBe(0);
    },
  );

  it("when a file holds one load case more than the limit, then it is refused with a 400 naming the limit", async () => {
    const name = `Too many cases ${randomUUID()}`;
    const file = exportFile(name, { locations: 1, combinations: 0, terms: PROJECT_LIMITS.loadCases + 1 });
    const response = await team.editor.agent.post(wsPath(team, "/project-imports")).send(file);
    expect(response.status).toBe(400);
    expectLimit(response.body, "loadCases", "loadCases");
    expect(await Project.count({ where: { name } })).toBe(0);
  });
});
