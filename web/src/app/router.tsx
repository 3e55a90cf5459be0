import { Suspense, lazy } from "react";
import { createBrowserRouter, Navigate } from "react-router-dom";
import { ForgotPasswordPage } from "../features/auth/components/ForgotPasswordPage";
import { ResetPasswordPage } from "../features/auth/components/ResetPasswordPage";
import { SignInPage } from "../features/auth/components/SignInPage";
import { SignUpPage } from "../features/auth/components/SignUpPage";
import { VerifyEmailPage } from "../features/auth/components/VerifyEmailPage";
import { HomePage } from "../features/home/components/HomePage";
import { MailboxPage } from "../features/mailbox/components/MailboxPage";
import { InvitationsSection } from "../features/workspaces/components/InvitationsSection";
import { AcceptInvitationPage, JoinShareLinkPage } from "../features/workspaces/components/JoinPages";
import { MembersSection } from "../features/workspaces/components/MembersSection";
import { SettingsSection } from "../features/workspaces/components/SettingsSection";
import { ShareLinksSection } from "../features/workspaces/components/ShareLinksSection";
import { WorkspacePage } from "../features/workspaces/components/WorkspacePage";
import { NewWorkspacePage, WorkspacesPage } from "../features/workspaces/components/WorkspacesPage";
import { Layout } from "./layout";
import { NotFoundPage } from "./not-found";
import { RequireSession } from "./require-session";

// Pages with heavy dependencies load as their own chunks, so the first page (often sign-in)
// stays light: the bench (d3, and three.js inside it), projects, the comparison (d3, tables) and
// the calculators (d3 for the through-wall plots).
// (The mailbox page stays in the main chunk: the header's mailbox link lives in the same file.)
// React Router's `lazy` loads the module before it renders the route.
const BenchPage = lazy(() =>
  import("../features/bench/components/BenchPage").then((m) => ({ default: m.BenchPage })),
);

export const router = createBrowserRouter([
  {
    element: <Layout />,
    // Shown while the first page's module loads (routes below load lazily).
    hydrateFallbackElement: <p className="p-6 text-graphite-soft">Opening Sigmacube…</p>,
    children: [
      { index: true, element: <HomePage /> },
      {
        path: "bench",
        element: (
          <RequireSession>
            <Suspense fallback={<p className="text-graphite-soft">Opening the bench…</p>}>
              <BenchPage />
            </Suspense>
          </RequireSession>
        ),
      },
      {
        // The calculators need no account (they compute in the browser); "send to bench" asks for sign-in there.
        path: "calculators",
        children: [
          {
            index: true,
            lazy: () =>
              import("../features/calculators/components/CalculatorsPage").then((m) => ({
                Component: m.CalculatorsPage,
              })),
          },
          {
            path: "thin-wall",
            lazy: () =>
              import("../features/calculators/components/ThinWallPage").then((m) => ({
                Component: m.ThinWallPage,
              })),
          },
          {
            path: "thick-cylinder",
            lazy: () =>
              import("../features/calculators/components/ThickCylinderPage").then((m) => ({
                Component: m.ThickCylinderPage,
              })),
          },
          {
            path: "thick-sphere",
            lazy: () =>
              import("../features/calculators/components/ThickSpherePage").then((m) => ({
                Component: m.ThickSpherePage,
              })),
          },
          {
            path: "shaft",
            lazy: () =>
              import("../features/calculators/components/ShaftPage").then((m) => ({
                Component: m.ShaftPage,
              })),
          },
          {
            path: "rosette",
            lazy: () =>
              import("../features/calculators/components/RosettePage").then((m) => ({
                Component: m.RosettePage,
              })),
          },
        ],
      },
      // Accounts (open to everyone; invitation and share-link pages handle signed-out visitors themselves).
      { path: "sign-in", element: <SignInPage /> },
      { path: "sign-up", element: <SignUpPage /> },
      { path: "forgot-password", element: <ForgotPasswordPage /> },
      { path: "reset-password/:token", element: <ResetPasswordPage /> },
      { path: "verify-email/:token", element: <VerifyEmailPage /> },
      { path: "invitations/:token", element: <AcceptInvitationPage /> },
      { path: "join/:token", element: <JoinShareLinkPage /> },
      { path: "dev/mailbox/:messageId?", element: <MailboxPage /> },
      {
        // Signed-in only: a signed-out visitor is sent to sign-in and brought back to the same address.
        element: <RequireSession />,
        children: [
          {
            path: "account",
            lazy: () =>
              import("../features/account/components/AccountPage").then((m) => ({
                Component: m.AccountPage,
              })),
          },
          { path: "workspaces", element: <WorkspacesPage /> },
          { path: "workspaces/new", element: <NewWorkspacePage /> },
          {
            path: "workspaces/:workspaceId/projects/:projectId",
            lazy: () => import("./review-composition").then((m) => ({ Component: m.ProjectPageWithReview })),
          },
          {
            path: "workspaces/:workspaceId/projects/:projectId/load-cases/:caseId/point-tables",
            lazy: () =>
              import("../features/point-tables/components/PointTablesPage").then((m) => ({
                Component: m.PointTablesPage,
              })),
          },
          {
            path: "workspaces/:workspaceId/projects/:projectId/comparison",
            lazy: () =>
              import("./review-composition").then((m) => ({ Component: m.ComparisonPageWithReview })),
          },
          // The review area: the revision table, one frozen record, and its print page.
          {
            path: "workspaces/:workspaceId/projects/:projectId/records",
            lazy: () =>
              import("../features/records/components/RecordsPage").then((m) => ({
                Component: m.RecordsPage,
              })),
          },
          {
            path: "workspaces/:workspaceId/projects/:projectId/records/:recordId",
            lazy: () =>
              import("../features/records/components/RecordPage").then((m) => ({
                Component: m.RecordPage,
              })),
          },
          {
            path: "workspaces/:workspaceId/projects/:projectId/records/:recordId/report",
            lazy: () =>
              import("./review-composition").then((m) => ({
                Component: m.RecordReportPageWithView,
              })),
          },
          {
            path: "workspaces/:workspaceId/projects/:projectId/linearization",
            lazy: () =>
              import("../features/linearization/components/LinearizationPage").then((m) => ({
                Component: m.LinearizationPage,
              })),
          },
          {
            path: "workspaces/:workspaceId/projects/:projectId/report",
            lazy: () =>
              import("../features/report/components/ReportPage").then((m) => ({
                Component: m.ReportPage,
              })),
          },
          {
            path: "workspaces/:workspaceId",
            element: <WorkspacePage />,
            children: [
              // A workspace opens on its projects: that is what its members come for.
              { index: true, element: <Navigate to="projects" replace /> },
              {
                path: "projects",
                lazy: () =>
                  import("../features/projects/components/ProjectsSection").then((m) => ({
                    Component: m.ProjectsSection,
                  })),
              },
              { path: "members", element: <MembersSection /> },
              { path: "invitations", element: <InvitationsSection /> },
              { path: "share-links", element: <ShareLinksSection /> },
              { path: "settings", element: <SettingsSection /> },
            ],
          },
        ],
      },
      { path: "*", element: <NotFoundPage /> },
    ],
  },
]);
