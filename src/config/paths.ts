/** Every URL of the client in one place: routes use `path`, links use `getHref`. */
export const paths = {
  home: { path: "/", getHref: () => "/" },
  safety: { path: "/safety", getHref: () => "/safety" },
  tables: {
    path: "/tables",
    getHref: () => "/tables",
    detail: { path: "/tables/:refrigerantId", getHref: (id: string) => `/tables/${encodeURIComponent(id)}` },
  },
} as const;
