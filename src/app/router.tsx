import { createBrowserRouter, matchRoutes, type RouteObject } from "react-router";
import { PageSpinner } from "../components/ui";
import { paths } from "../config/paths";
import { AppShell } from "./layout/app-shell";
import { NotFoundRoute, RootErrorBoundary, RouteErrorBoundary } from "./routes/errors";

// Route modules are loaded on demand and export `Component` (and, when they need one, `loader`,
// `ErrorBoundary`). Heavy pages (the 3D green, charts) stay out of the first download this way.
// To add a page: create src/app/routes/<name>.tsx exporting `Component`, register it below with its
// path from src/config/paths.ts, and add a nav item in src/app/nav.ts.
export function createAppRoutes(): RouteObject[] {
  return [
    {
      path: paths.home.path,
      Component: AppShell,
      ErrorBoundary: RootErrorBoundary,
      HydrateFallback: PageSpinner,
      children: [
        {
          // Errors in a page render inside the shell, so the top bar keeps working.
          ErrorBoundary: RouteErrorBoundary,
          children: [
            { index: true, lazy: () => import("./routes/home") },
            { path: paths.signIn.path, lazy: () => import("./routes/auth/sign-in") },
            { path: paths.signUp.path, lazy: () => import("./routes/auth/sign-up") },
            { path: paths.forgotPassword.path, lazy: () => import("./routes/auth/forgot-password") },
            { path: paths.resetPassword.path, lazy: () => import("./routes/auth/reset-password") },
            { path: paths.account.path, lazy: () => import("./routes/account") },
            { path: paths.read.path, lazy: () => import("./routes/read") },
            { path: paths.breakChart.path, lazy: () => import("./routes/chart") },
            { path: paths.rehearse.path, lazy: () => import("./routes/rehearse") },
            { path: paths.train.path, lazy: () => import("./routes/train") },
            // practice log and make rates (issue 5)
            { path: paths.practice.path, lazy: () => import("./routes/practice") },
            { path: paths.practiceImport.path, lazy: () => import("./routes/practice-import") },
            { path: paths.practicePlan.path, lazy: () => import("./routes/practice-plan") },
            { path: paths.session.path, lazy: () => import("./routes/practice-session") },
            { path: paths.greens.path, lazy: () => import("./routes/greens") },
            { path: paths.green.path, lazy: () => import("./routes/green") },
            // green height maps (issue 8): reached from the green's page, no nav item
            { path: paths.greenMap.path, lazy: () => import("./routes/green-map") },
            { path: paths.rounds.path, lazy: () => import("./routes/rounds") },
            { path: paths.round.path, lazy: () => import("./routes/round") },
            { path: paths.stats.path, lazy: () => import("./routes/stats") },
            // coaching (issue 6): squads, invitations, ladders, running a ladder, the coach's views
            { path: paths.squads.path, lazy: () => import("./routes/coaching/squads") },
            { path: paths.squad.path, lazy: () => import("./routes/coaching/squad") },
            { path: paths.join.path, lazy: () => import("./routes/coaching/join") },
            { path: paths.ladders.path, lazy: () => import("./routes/coaching/ladders") },
            { path: paths.ladderNew.path, lazy: () => import("./routes/coaching/ladder-edit") },
            { path: paths.myLadders.path, lazy: () => import("./routes/coaching/my-ladders") },
            { path: paths.runLadder.path, lazy: () => import("./routes/coaching/run-ladder") },
            { path: paths.ladder.path, lazy: () => import("./routes/coaching/ladder") },
            { path: paths.ladderEdit.path, lazy: () => import("./routes/coaching/ladder-edit") },
            { path: paths.coach.path, lazy: () => import("./routes/coaching/coach") },
            { path: paths.coachPlayer.path, lazy: () => import("./routes/coaching/coach-player") },
            // admin screens (issue 15)
            { path: paths.admin.path, lazy: () => import("./routes/admin/users") },
            { path: paths.adminCoaching.path, lazy: () => import("./routes/admin/coaching") },
            { path: paths.adminAudit.path, lazy: () => import("./routes/admin/audit") },
            { path: paths.mailbox.path, lazy: () => import("./routes/dev/mailbox") },
            { path: "*", Component: NotFoundRoute },
          ],
        },
      ],
    },
  ];
}

/** The browser's router, for a page drawn here (created at once, so the first render happens as the entry runs). */
export function createAppRouter() {
  return createBrowserRouter(createAppRoutes());
}

/**
 * The routes for a page the server sent already drawn (src/prerender.tsx), with the route modules the URL matches
 * already loaded, so the router's first render is the page itself, as drawn, and not its loading placeholder —
 * React can then hydrate the HTML instead of replacing it (React Router's guidance for lazy routes with server
 * rendering). src/main.tsx creates the router from them.
 */
export async function loadDrawnPageRoutes() {
  const routes = createAppRoutes();
  const lazyMatches = (matchRoutes(routes, window.location) ?? []).filter((m) => typeof m.route.lazy === "function");
  await Promise.all(
    lazyMatches.map(async ({ route }) => {
      const module = await (route.lazy as () => Promise<Partial<RouteObject>>)();
      Object.assign(route, { ...module, lazy: undefined });
    }),
  );
  return routes;
}
