/** Every route of the app in one place, so links and the router cannot drift apart. */
export const paths = {
  home: "/",
  signUp: "/sign-up",
  signIn: "/sign-in",
  forgotPassword: "/forgot-password",
  resetPassword: (token: string) => `/reset-password/${encodeURIComponent(token)}`,
  invitation: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  projects: "/projects",
  project: (projectId: string) => `/projects/${encodeURIComponent(projectId)}`,
  projectSection: (projectId: string, section: string) => `/projects/${encodeURIComponent(projectId)}/${section}`,
  people: "/people",
  account: "/account",
  priceBook: "/price-book",
} as const;

/** Where to go after signing in: only a path on this site, never another origin. */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || next === "/" || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return paths.projects;
  if (next.startsWith(paths.signIn) || next.startsWith(paths.signUp)) return paths.projects;
  return next;
}

export function signInWithNext(next: string): string {
  return `${paths.signIn}?next=${encodeURIComponent(next)}`;
}
