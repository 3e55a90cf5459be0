/**
 * The CT-7 demo's calculation records (issue 14), as data the seed reads. INVENTED FOR THE
 * PRODUCT, like the rest of the scenario: the people are the demo team of db/seed-accounts.ts
 * (named here by their demo e-mail addresses), the texts are made up.
 *
 * - The agitator shaft is approved: Teo Valdric (editor) submitted it, Ines Okafor-Lund
 *   (reviewer) checked and approved it — two different people, as independence asks.
 * - The shell and heads came back: Teo submitted it, Ines returned it with a comment on the
 *   whole record and one on the failing row (the hydrostatic test at the head-to-shell junction).
 */

export type DemoRowRef = { caseName: string; locationName: string };

export type DemoReview = {
  projectName: string;
  originatorEmail: string;
  checkerEmail: string;
  reason: string;
} & (
  | { outcome: "approved"; approvalComment: string }
  | {
      outcome: "returned";
      returnComment: string;
      comments: { text: string; row: DemoRowRef | null }[];
    }
);

const TEO = "teo.valdric@quillon.example";
const INES = "ines.okafor-lund@quillon.example";

export const CT7_REVIEWS: readonly DemoReview[] = [
  {
    projectName: "CT-7 agitator shaft",
    originatorEmail: TEO,
    checkerEmail: INES,
    reason: "First issue: shaft at the coupling under steady running and start-up torque.",
    outcome: "approved",
    approvalComment: "Section properties and torque values checked against the drive data sheet.",
  },
  {
    projectName: "CT-7 shell and heads",
    originatorEmail: TEO,
    checkerEmail: INES,
    reason: "First issue: shell and head-to-shell junction for design, operating, vacuum and test.",
    outcome: "returned",
    returnComment:
      "The hydrostatic test fails 1.5 at the junction; either justify the test factor or revise the junction.",
    comments: [
      { text: "State the source of the junction bending coefficient (133 × p) in the record.", row: null },
      {
        text: "Tresca factor 1.30 under the hydrostatic test: is the discontinuity bending taken at the outer surface?",
        row: { caseName: "Hydrostatic test", locationName: "head-to-shell junction" },
      },
    ],
  },
];
