import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { projectExportSchema, PROJECT_EXPORT_SCHEMA_VERSION } from "../../core/contract/project-export";
import { AuditEvent } from "../../db/models/audit-event";
import { Material } from "../../db/models/material";
import { Project } from "../../db/models/project";
import { StressState } from "../../db/models/stress-state";
import { buildTestApp } from "../support/app";
import { mpa, projectTeam, projectWithLocations, wsPath, type ProjectTeam } from "../support/project-team";

const { app, close } = buildTestApp({ webDist: null });
afterAll(close);

let team: ProjectTeam;
let source: string;
let exported: Record<string, unknown>;

beforeAll(async () => {
  team = await projectTeam(app);
  const material = await team.editor.agent
    .post(wsPath(team, "/materials"))
    .send({
      name: "Shaft steel, bar 45",
      unit: "MPa",
      yield: 420,
      ultimateTension: 650,
      reference: "certificate 88-2",
    })
    .expect(201);
  const made = await projectWithLocations(
    team,
    {
      name: "CT-7 agitator shaft",
      defaultMaterial: { kind: "workspace", id: material.body.material.id },
      requirements: [{ criterion: "von-mises", requiredFactor: 2 }],
      categoryRequirements: [{ category: "start-up", factors: { "von-mises": 1.25 } }],
      includeUnsuitedCriteria: true,
    },
    ["keyway", "bearing seat"],
  );
  source = made.projectId;
  const base = wsPath(team, `/projects/${source}`);
  const a = await team.editor.agent
    .post(`${base}/load-cases`)
    .send({
      name: "Start-up",
      category: "start-up",
      states: [
        {
          locationId: made.locationIds[0],
          stress: { unit: "ksi", components: { xx: 7, yy: 0, zz: 0, xy: 9.1, yz: 0, zx: 0 } },
        },
      ],
    })
    .expect(201);
  const b = await team.editor.agent
    .post(`${base}/load-cases`)
    .send({
      name: "Steady running",
      states: [{ locationId: made.locationIds[0], stress: mpa(45, 0, 0, 47.5) }],
    })
    .expect(201);
  await team.editor.agent
    .post(`${base}/combinations`)
    .send({
      name: "Both",
      terms: [
        { loadCaseId: a.body.loadCase.id, factor: 1 },
        { loadCaseId: b.body.loadCase.id, factor: 0.5 },
      ],
    })
    .expect(201);
  const response = await team.viewer.agent.get(`${base}/export`).expect(200);
  expect(response.headers["content-disposition"]).toBe(
    'attachment; filename="ct-7-agitator-shaft.sigmacube.json"',
  );
  exported = response.body;
});

describe("project export and import", () => {
  it("when a project is exported, then the file matches its schema, version 4, with Pa values as stored and the per-category factors", async () => {
    const file = projectExportSchema.parse(exported);
    expect(file.schemaVersion).toBe(PROJECT_EXPORT_SCHEMA_VERSION);
    expect(PROJECT_EXPORT_SCHEMA_VERSION).toBe(4);
    expect(file.project.categoryRequirements).toEqual([
      { category: "start-up", factors: { "von-mises": 1.25 } },
    ]);
    expect(file.project.includeUnsuitedCriteria).toBe(true);
    expect(file.materials).toEqual([
      expect.objectContaining({ key: "m1", yieldPa: 420e6, reference: "certificate 88-2" }),
    ]);
    expect(file.project.defaultMaterial).toEqual({ kind: "library", key: "m1" });
    const stored = await StressState.findOne({
      where: { unit: "ksi", xyPa: file.loadCases[0].states[0].componentsPa.xy },
    });
    expect(stored).not.toBeNull();
    expect(file.combinations[0].terms).toEqual([
      { loadCase: "c1", factor: 1 },
      { loadCase: "c2", factor: 0.5 },
    ]);
  });

  it("when the file is imported into another workspace by its editor, then the same project appears with the same numbers and the import is audited", async () => {
    const other = await team.editor.agent.post("/api/workspaces").send({ name: "Client copy" }).expect(201);
    const target = other.body.workspace.id;
    const imported = await team.editor.agent.post(`/api/workspaces/${target}/project-imports`).send(exported);
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    expect(imported.body.counts).toEqual({ materials: 1, locations: 2, loadCases: 2, combinations: 1 });
    const again = await team.editor.agent
      .get(`/api/workspaces/${target}/projects/${imported.body.project.id}/export`)
      .expect(200);
    const strip = (f: Record<string, unknown>) => ({ ...f, exportedAt: "" });
    expect(strip(again.body)).toEqual(strip(exported));
    const before = await team.viewer.agent.get(wsPath(team, `/projects/${source}/comparison`)).expect(200);
    const after = await team.editor.agent
      .get(`/api/workspaces/${target}/projects/${imported.body.project.id}/comparison`)
      .expect(200);
    expect(after.body.summary).toBe(before.body.summary);
    expect(await AuditEvent.count({ where: { projectId: imported.body.project.id, action: "import" } })).toBe(
      1,
    );
  });

  it("when a version-1 file (written before per-category factors) is imported, then it is read with its requirements as the project default and no category factors", async () => {
    const v1 = structuredClone(exported) as { schemaVersion: number; project: Record<string, unknown> };
    v1.schemaVersion = 1;
    delete v1.project.categoryRequirements;
    delete v1.project.includeUnsuitedCriteria;
    v1.project.name = `Version one ${Date.now()}`;
    const imported = await team.editor.agent.post(wsPath(team, "/project-imports")).send(v1);
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    const project = await team.editor.agent
      .get(wsPath(team, `/projects/${imported.body.project.id}`))
      .expect(200);
    expect(project.body.project).toMatchObject({
      requirements: [{ criterion: "von-mises", requiredFactor: 2 }],
      categoryRequirements: [],
      includeUnsuitedCriteria: false,
    });
    // Exported again, it is a file of today's version.
    const again = await team.editor.agent
      .get(wsPath(team, `/projects/${imported.body.project.id}/export`))
      .expect(200);
    expect(again.body.schemaVersion).toBe(4);
    expect(again.body.project.categoryRequirements).toEqual([]);
  });

  it("when a version-2 file lacks the category factors or gives one for a criterion the project does not check, then it is refused naming the field", async () => {
    const missing = structuredClone(exported) as { project: Record<string, unknown> };
    delete missing.project.categoryRequirements;
    const r1 = await team.editor.agent.post(wsPath(team, "/project-imports")).send(missing).expect(400);
    expect(r1.body.error.details.map((d: { path: string }) => d.path)).toContain(
      "project.categoryRequirements",
    );
    const stray = structuredClone(exported) as { project: Record<string, unknown> };
    stray.project.categoryRequirements = [{ category: "test", factors: { tresca: 1.1 } }];
    const r2 = await team.editor.agent.post(wsPath(team, "/project-imports")).send(stray).expect(400);
    expect(r2.body.error.details).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          path: "project.categoryRequirements.0.factors.tresca",
          message: expect.stringMatching(/does not check Tresca/),
        }),
      ]),
    );
  });

  it("when a viewer imports, then 403", async () => {
    await team.viewer.agent.post(wsPath(team, "/project-imports")).send(exported).expect(403);
  });

  it("when a malformed file is imported, then it is refused whole with every reason and nothing is written", async () => {
    const file = structuredClone(exported) as ReturnType<typeof projectExportSchema.parse>;
    const name = `Malformed ${Date.now()}`;
    const bad = {
      ...file,
      schemaVersion: 5,
      project: { ...file.project, name, defaultMaterial: { kind: "library", key: "nowhere" } },
      locations: [file.locations[0], { ...file.locations[1], key: file.locations[0].key }],
      loadCases: [
        { ...file.loadCases[0], states: [{ ...file.loadCases[0].states[0], location: "l9", unit: "bar" }] },
        file.loadCases[1],
      ],
      combinations: [{ ...file.combinations[0], terms: [{ loadCase: "c7", factor: 1 }] }],
    };
    const materialsBefore = await Material.count();
    const response = await team.editor.agent.post(wsPath(team, "/project-imports")).send(bad);
    expect(response.status).toBe(400);
    const paths = response.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(["schemaVersion", "loadCases.0.states.0.unit"]));
    expect(await Project.count({ where: { name } })).toBe(0);
    expect(await Material.count()).toBe(materialsBefore);

    // With the version right and the unit known, the cross-references are reported, each by path.
    const crossBad = {
      ...bad,
      schemaVersion: 1,
      loadCases: [
        { ...bad.loadCases[0], states: [{ ...bad.loadCases[0].states[0], unit: "MPa" }] },
        file.loadCases[1],
      ],
    };
    const cross = await team.editor.agent.post(wsPath(team, "/project-imports")).send(crossBad);
    expect(cross.status).toBe(400);
    expect(cross.body.error.details.map((d: { path: string }) => d.path)).toEqual(
      expect.arrayContaining([
        "locations.1.key",
        "project.defaultMaterial",
        "loadCases.0.states.0.location",
        "combinations.0.terms.0.loadCase",
      ]),
    );
    expect(await Project.count({ where: { name } })).toBe(0);
  });

  it("when the database fails halfway through an import, then the transaction leaves nothing behind", async () => {
    const name = `Half ${Date.now()}`;
    const file = { ...exported, project: { ...(exported.project as object), name } };
    const materialsBefore = await Material.count();
    // Fault injection: the second stress state's insert fails after the project, materials,
    // locations and the first case are written.
    let inserted = 0;
    StressState.addHook("beforeCreate", "fail-second", () => {
      inserted += 1;
      if (inserted === 2) throw new Error("simulated failure while writing states");
    });
    try {
      const response = await team.editor.agent.post(wsPath(team, "/project-imports")).send(file);
      expect(response.status).toBe(500);
    } finally {
      StressState.removeHook("beforeCreate", "fail-second");
    }
    expect(inserted).toBe(2);
    expect(await Project.count({ where: { name } })).toBe(0);
    expect(await Material.count()).toBe(materialsBefore);
  });
});
