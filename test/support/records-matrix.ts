import type { Role } from "../../core/contract/workspaces";
import { freezeProjectContent } from "../../api/domain/records/freeze";
import { Membership } from "../../db/models/membership";
import { User } from "../../db/models/user";
import { insertRecord, setRecordStatus } from "../../db/repositories/records";
import { projectWorld } from "./project-area-matrix";
import type { Actor, RoleFixture } from "./role-fixture";

/**
 * The role-matrix rows of the review and its records, spread into the table of
 * test/api/role-matrix.test.ts. Who may do what: everyone who reads the project reads the
 * review, the records and their diff; editors and owners submit; reviewers, editors and owners
 * comment; reviewers and owners return and approve (editors get 403: they write calculations,
 * they do not sign them off); owners set the approvals a record needs.
 */
type Row = {
  who: "public" | "signed-in" | Role;
  ok: number;
  except?: Partial<Record<Actor, number>>;
  request: (f: RoleFixture) => Promise<{ path: string; body?: Record<string, unknown> }>;
};

type RecordWorld = { projectPath: string; returnedId: string; submittedId: string };

const worlds = new WeakMap<RoleFixture, Promise<RecordWorld>>();

/**
 * The fixture's project with two records straight in the database, both submitted by the
 * fixture's editor: record 1 returned, record 2 waiting for a check.
 */
function recordWorld(f: RoleFixture): Promise<RecordWorld> {
  if (!worlds.has(f)) {
    worlds.set(
      f,
      (async () => {
        const { projectId } = await projectWorld(f);
        const editorMembership = await Membership.findOne({
          where: { workspaceId: f.workspaceId, role: "editor" },
        });
        const editor = (await User.findByPk(editorMembership!.userId))!;
        const frozen = await freezeProjectContent(f.context.sequelize, f.workspaceId, projectId);
        const record = (number: number) =>
          insertRecord({
            projectId,
            workspaceId: f.workspaceId,
            number,
            revision: "A",
            reason: `matrix record ${number}`,
            content: frozen.content,
            hash: frozen.hash,
            engineVersion: frozen.content.engine.version,
            requiredApprovals: 1,
            inputEditors: frozen.inputEditors,
            submittedBy: editor.id,
            submittedByName: editor.name,
            submittedAt: new Date(),
          });
        const returned = await record(1);
        await setRecordStatus(returned.id, {
          status: "returned",
          returnedBy: null,
          returnedByName: "Matrix reviewer",
          returnedAt: new Date(),
          returnComment: "matrix",
        });
        const submitted = await record(2);
        return {
          projectPath: `/api/workspaces/${f.workspaceId}/projects/${projectId}`,
          returnedId: returned.id,
          submittedId: submitted.id,
        };
      })(),
    );
  }
  return worlds.get(f)!;
}

const underProject = async (f: RoleFixture, rest: string) =>
  `/api/workspaces/${f.workspaceId}/projects/${(await projectWorld(f)).projectId}${rest}`;
const submitted = async (f: RoleFixture, rest = "") => {
  const w = await recordWorld(f);
  return `${w.projectPath}/records/${w.submittedId}${rest}`;
};

const P = "/api/workspaces/{workspaceId}/projects/{projectId}";

export const recordRows: Record<string, Row> = {
  [`GET ${P}/review`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await underProject(f, "/review") }),
  },
  [`PATCH ${P}/review`]: {
    who: "owner",
    ok: 200,
    request: async (f) => ({ path: await underProject(f, "/review"), body: { requiredApprovals: 2 } }),
  },
  [`POST ${P}/records`]: {
    who: "editor",
    ok: 201,
    request: async (f) => ({
      path: await underProject(f, "/records"),
      body: { reason: "Matrix submission" },
    }),
  },
  [`GET ${P}/records`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await underProject(f, "/records") }),
  },
  [`GET ${P}/records/{recordId}`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await submitted(f) }),
  },
  [`GET ${P}/records/{recordId}/diff`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await submitted(f, "/diff") }),
  },
  [`GET ${P}/records/{recordId}/report.pdf`]: {
    who: "viewer",
    ok: 200,
    request: async (f) => ({ path: await submitted(f, "/report.pdf") }),
  },
  [`POST ${P}/records/{recordId}/comments`]: {
    who: "reviewer",
    ok: 201,
    request: async (f) => ({ path: await submitted(f, "/comments"), body: { text: "Matrix comment" } }),
  },
  [`POST ${P}/records/{recordId}/return`]: {
    who: "reviewer",
    ok: 200,
    except: { editor: 403 },
    request: async (f) => ({ path: await submitted(f, "/return"), body: { comment: "Matrix return" } }),
  },
  [`POST ${P}/records/{recordId}/approve`]: {
    who: "reviewer",
    ok: 200,
    except: { editor: 403 },
    request: async (f) => ({ path: await submitted(f, "/approve"), body: {} }),
  },
};
