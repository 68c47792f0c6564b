import { createBrowserRouter, Navigate, type RouteObject } from "react-router-dom";
import { paths } from "../config/paths";
import { projectSections } from "../features/projects/components/sections";
import { AuthLayout } from "./layouts/auth-layout";
import { AccountRoute } from "./routes/account";
import { SignedInLayout } from "./layouts/signed-in-layout";
import { RouteError } from "./routes/route-error";
import { ForgotPasswordRoute } from "./routes/forgot-password";
import { InvitationRoute } from "./routes/invitation";
import { NotFoundRoute } from "./routes/not-found";
import { PeopleRoute } from "./routes/people";
import { ProjectIndexRoute, ProjectRoute } from "./routes/project";
import { ProjectSectionRoute } from "./routes/project-section";
import { ProjectsRoute } from "./routes/projects";
import { ResetPasswordRoute } from "./routes/reset-password";
import { SignInRoute } from "./routes/sign-in";
import { SignUpRoute } from "./routes/sign-up";
import { lazy, Suspense } from "react";

const PriceBookRoute = lazy(() => import("../features/price-book/price-book-route"));
const PortalRoute = lazy(() => import("../features/portal/portal-route"));

export const routes: RouteObject[] = [
  {
    errorElement: <RouteError />,
    children: [
      {
        element: <AuthLayout />,
        children: [
          { path: paths.signIn, element: <SignInRoute /> },
          { path: paths.signUp, element: <SignUpRoute /> },
          { path: paths.forgotPassword, element: <ForgotPasswordRoute /> },
          { path: "/reset-password/:token", element: <ResetPasswordRoute /> },
          { path: "/invitations/:token", element: <InvitationRoute /> },
          { path: "*", element: <NotFoundRoute /> },
        ],
      },
      {
        element: <SignedInLayout />,
        children: [
          { index: true, element: <Navigate to={paths.projects} replace /> },
          { path: paths.projects, element: <ProjectsRoute /> },
          {
            path: "/projects/:projectId",
            element: <ProjectRoute />,
            children: [
              { index: true, element: <ProjectIndexRoute /> },
              ...projectSections.map((section) => ({ path: section.slug, element: <ProjectSectionRoute section={section} /> })),
              { path: "*", element: <NotFoundRoute inline /> },
            ],
          },
          { path: paths.people, element: <PeopleRoute /> },
          { path: paths.account, element: <AccountRoute /> },
          { path: paths.priceBook, element: <Suspense><PriceBookRoute /></Suspense> },
          { path: "/portal/proposals/:proposalId", element: <Suspense><PortalRoute /></Suspense> },
        ],
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
