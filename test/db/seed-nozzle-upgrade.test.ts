import { afterAll, describe, expect, inject, it } from "vitest";
import { ct7NozzlePointTable } from "../../core/demo-data/ct7-nozzle-points";
import { ensureDatabase } from "../../db/ensure-database";
import { migrate } from "../../db/migrate";
import { LoadCase } from "../../db/models/load-case";
import { PointTable } from "../../db/models/point-table";
import { Project } from "../../db/models/project";
import { seedDemo } from "../../db/seed";
import { upgradeDemoNozzleProject } from "../../db/seed-nozzle-upgrade";
import { buildTestApp } from "../support/app";

const OLD_TEXT =
  "Finite-element point tensors around nozzle N2. Point tables (CSV uploads evaluated in the browser) come in a later version; this project is empty until then.";

describe("a demo database seeded before point tables", () => {
  const adminUrl = inject("adminUrl");
  const databaseUrl = adminUrl.replace(/\/postgres$/, "/sigmacube_seed_nozzle_upgrade");
  let closeApp: () => Promise<void> = async () => {};
  afterAll(() => closeApp());

  it("when the upgrade step runs on the nozzle project as the older seed left it, then it gains its load case and point table once; a project someone changed is left alone", async () => {
    await ensureDatabase(adminUrl, "sigmacube_seed_nozzle_upgrade");
    const { context, close } = buildTestApp({ databaseUrl });
    closeApp = close;
    const { sequelize } = context;
    await migrate(sequelize);
    await seedDemo(sequelize);
    const demo = ct7NozzlePointTable();
    const project = (await Project.findOne({ where: { name: demo.projectName } }))!;
    // Put it back the way the older seed made it: the placeholder text, no case, no table.
    const asOlderSeed = async (description: string) => {
      await PointTable.destroy({ where: { projectId: project.id } });
      await LoadCase.destroy({ where: { projectId: project.id } });
      await project.update({ description });
    };
    await asOlderSeed(OLD_TEXT);

    const lines: string[] = [];
    const points = await sequelize.transaction((t) => upgradeDemoNozzleProject(t, (l) => lines.push(l)));
    expect(points).toBe(30_000);
    expect(lines).toEqual([expect.stringMatching(/nozzle project gets its point table \(30000 points\)/)]);
    const cases = await LoadCase.findAll({ where: { projectId: project.id } });
    expect(cases.map((c) => [c.name, c.category])).toEqual([[demo.caseName, "test"]]);
    const tables = await PointTable.findAll({ where: { projectId: project.id } });
    expect(tables.map((t) => [t.loadCaseId, t.pointCount])).toEqual([[cases[0].id, 30_000]]);
    expect((await project.reload()).description).not.toBe(OLD_TEXT);

    // Run again: it is no longer the older seed's project, so nothing more is added.
    expect(await sequelize.transaction((t) => upgradeDemoNozzleProject(t, () => {}))).toBe(0);
    expect(await PointTable.count({ where: { projectId: project.id } })).toBe(1);

    // Someone wrote their own description on the empty project: theirs stays, nothing is added.
    await asOlderSeed("Our own notes on N2");
    expect(await sequelize.transaction((t) => upgradeDemoNozzleProject(t, () => {}))).toBe(0);
    expect(await LoadCase.count({ where: { projectId: project.id } })).toBe(0);
    expect((await project.reload()).description).toBe("Our own notes on N2");
  });
});
