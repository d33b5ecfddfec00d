/** Every URL of the client in one place: routes use `path`, links use `getHref`. */
export const paths = {
  home: { path: "/", getHref: () => "/" },
  safety: { path: "/safety", getHref: () => "/safety" },
  tables: {
    path: "/tables",
    getHref: () => "/tables",
    detail: { path: "/tables/:refrigerantId", getHref: (id: string) => `/tables/${encodeURIComponent(id)}` },
  },

  // Public account screens (outside the app shell).
  signIn: {
    path: "/sign-in",
    /** `next` is where to go back to after signing in. */
    getHref: (next?: string) => (next && next !== "/" ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in"),
  },
  signUp: { path: "/sign-up", getHref: () => "/sign-up" },
  forgotPassword: { path: "/forgot-password", getHref: () => "/forgot-password" },
  // The server mails links to these two; keep them in step with server/routes/{auth,invitations}.ts.
  resetPassword: {
    path: "/reset-password",
    getHref: (token: string) => `/reset-password?token=${encodeURIComponent(token)}`,
  },
  acceptInvitation: {
    path: "/accept-invitation",
    getHref: (token: string) => `/accept-invitation?token=${encodeURIComponent(token)}`,
  },

  jobs: {
    path: "/jobs",
    /** `status` narrows the list, e.g. the review queue is /jobs?status=awaiting-review. */
    getHref: (status?: string) => (status ? `/jobs?status=${encodeURIComponent(status)}` : "/jobs"),
  },
  equipment: {
    path: "/equipment",
    getHref: () => "/equipment",
    new: { path: "/equipment/new", getHref: () => "/equipment/new" },
    detail: { path: "/equipment/:equipmentId", getHref: (id: string) => `/equipment/${encodeURIComponent(id)}` },
  },
  visits: {
    detail: { path: "/visits/:visitId", getHref: (id: string) => `/visits/${encodeURIComponent(id)}` },
    report: { path: "/visits/:visitId/report", getHref: (id: string) => `/visits/${encodeURIComponent(id)}/report` },
  },

  casebook: {
    path: "/casebook",
    getHref: () => "/casebook",
    new: { path: "/casebook/new", getHref: () => "/casebook/new" },
    team: { path: "/casebook/team", getHref: () => "/casebook/team" },
    case: { path: "/casebook/cases/:caseId", getHref: (id: string) => `/casebook/cases/${encodeURIComponent(id)}` },
    edit: {
      path: "/casebook/cases/:caseId/edit",
      getHref: (id: string) => `/casebook/cases/${encodeURIComponent(id)}/edit`,
    },
  },

  cylinders: { path: "/cylinders", getHref: () => "/cylinders" },
  register: { path: "/register", getHref: () => "/register" },

  members: { path: "/members", getHref: () => "/members" },
  companySettings: { path: "/company-limits", getHref: () => "/company-limits" },
  profile: { path: "/profile", getHref: () => "/profile" },
  outbox: { path: "/outbox", getHref: () => "/outbox" },
} as const;
