/**
 * The GET routes the screens call, one line each, so a route that gains a query (`?limit=`,
 * `?after=`) or changes its path is a one-line edit. `as`: who calls it; `connections`: the
 * concurrency levels measured; `list`: also measured on a demo-size database, to show its time
 * does not grow with the organisation's rows; `conditional`: sent again with the ETag of a
 * first answer (If-None-Match), expecting 304; `streamed`: written as it is read, so its time to
 * first byte is measured too (bench/api/first-byte.ts).
 */
export interface BenchIds {
  equipmentId: string;
  /** The unit the 10,000-reading visit is on: its detail judges that visit's last settled state. */
  loggedEquipmentId: string;
  visitId: string;
  longVisitId: string;
  cylinderId: string;
}

export type Person = "tech" | "senior" | "owner";

export interface BenchRoute {
  name: string;
  path: (ids: BenchIds) => string;
  as: Person;
  connections: readonly number[];
  list?: boolean;
  conditional?: boolean;
  streamed?: boolean;
}

export const ROUTES: readonly BenchRoute[] = [
  // Today (home): the open, sent-back and awaiting-review lists.
  { name: "today: open visits", path: () => "/api/visits?status=open", as: "tech", connections: [1, 10], list: true },
  {
    name: "today: sent back",
    path: () => "/api/visits?status=sent-back",
    as: "tech",
    connections: [1, 10],
    list: true,
  },
  {
    name: "today: awaiting review",
    path: () => "/api/visits?status=awaiting-review",
    as: "senior",
    connections: [1, 10],
    list: true,
  },
  // Jobs and equipment lists (server-driven paging: owned by the lists' engineer).
  { name: "jobs list", path: () => "/api/visits", as: "tech", connections: [1, 10], list: true },
  { name: "equipment list", path: () => "/api/equipment", as: "tech", connections: [1, 10], list: true },
  // The same page length at both sizes (the demo company has 4 visits and 3 units, so its full
  // pages are shorter than the large set's 50 rows): their ratio is the organisation's size alone.
  { name: "jobs list, 3 rows", path: () => "/api/visits?limit=3", as: "tech", connections: [1], list: true },
  { name: "equipment list, 3 rows", path: () => "/api/equipment?limit=3", as: "tech", connections: [1], list: true },
  // Their searches and sorts: a common word, two rare ones, a word found nowhere (every row read if unindexed).
  { name: "jobs search clinic", path: () => "/api/visits?q=clinic", as: "tech", connections: [1], list: true },
  {
    name: "jobs search ironbark pharmacy",
    path: () => "/api/visits?q=ironbark%20pharmacy",
    as: "tech",
    connections: [1],
    list: true,
  },
  { name: "jobs search no match", path: () => "/api/visits?q=zzqx", as: "tech", connections: [1], list: true },
  { name: "jobs sort unit", path: () => "/api/visits?sort=equipmentName", as: "tech", connections: [1], list: true },
  { name: "jobs sort reason", path: () => "/api/visits?sort=reason", as: "tech", connections: [1], list: true },
  { name: "jobs sort status", path: () => "/api/visits?sort=status", as: "tech", connections: [1], list: true },
  { name: "equipment search r32", path: () => "/api/equipment?q=r32", as: "tech", connections: [1], list: true },
  { name: "equipment search no match", path: () => "/api/equipment?q=zzqx", as: "tech", connections: [1], list: true },
  { name: "equipment sort place", path: () => "/api/equipment?sort=place", as: "tech", connections: [1], list: true },
  {
    name: "equipment sort circuits",
    path: () => "/api/equipment?sort=circuits&dir=desc",
    as: "tech",
    connections: [1],
    list: true,
  },
  {
    name: "equipment sort factory charge",
    path: () => "/api/equipment?sort=factoryCharge&dir=desc",
    as: "tech",
    connections: [1],
    list: true,
  },
  { name: "customers", path: () => "/api/customers", as: "tech", connections: [1], list: true },
  { name: "sites", path: () => "/api/sites", as: "tech", connections: [1], list: true },
  // Equipment detail.
  { name: "equipment detail", path: (ids) => `/api/equipment/${ids.equipmentId}`, as: "tech", connections: [1] },
  {
    name: "equipment detail, logged unit",
    path: (ids) => `/api/equipment/${ids.loggedEquipmentId}`,
    as: "tech",
    connections: [1],
  },
  {
    name: "equipment visits",
    path: (ids) => `/api/visits?equipmentId=${ids.equipmentId}`,
    as: "tech",
    connections: [1],
  },
  {
    name: "equipment refrigerant",
    path: (ids) => `/api/equipment/${ids.equipmentId}/refrigerant`,
    as: "tech",
    connections: [1],
  },
  {
    name: "equipment charge references",
    path: (ids) => `/api/equipment/${ids.equipmentId}/charge-references`,
    as: "tech",
    connections: [1],
  },
  // A visit (run log): an ordinary one, the 10,000-reading one, and its conditional refresh.
  { name: "visit detail", path: (ids) => `/api/visits/${ids.visitId}`, as: "tech", connections: [1] },
  {
    name: "visit detail, 10,000 readings",
    path: (ids) => `/api/visits/${ids.longVisitId}`,
    as: "tech",
    connections: [1],
  },
  {
    name: "visit detail, 10,000 readings, 304",
    path: (ids) => `/api/visits/${ids.longVisitId}`,
    as: "tech",
    connections: [1],
    conditional: true,
  },
  {
    name: "visit refrigerant",
    path: (ids) => `/api/visits/${ids.longVisitId}/refrigerant`,
    as: "tech",
    connections: [1],
  },
  // Procedures of a visit.
  {
    name: "electrical checks",
    path: (ids) => `/api/visits/${ids.longVisitId}/electrical-checks`,
    as: "tech",
    connections: [1],
  },
  {
    name: "leak searches",
    path: (ids) => `/api/visits/${ids.longVisitId}/leak-searches`,
    as: "tech",
    connections: [1],
  },
  {
    name: "standing-pressure checks",
    path: (ids) => `/api/visits/${ids.longVisitId}/standing-pressure-checks`,
    as: "tech",
    connections: [1],
  },
  {
    name: "pressure tests",
    path: (ids) => `/api/visits/${ids.longVisitId}/pressure-tests`,
    as: "tech",
    connections: [1],
  },
  { name: "evacuations", path: (ids) => `/api/visits/${ids.longVisitId}/evacuations`, as: "tech", connections: [1] },
  // Register and cylinders.
  { name: "register", path: () => "/api/register", as: "owner", connections: [1, 10], list: true },
  { name: "register newest first", path: () => "/api/register?dir=desc", as: "owner", connections: [1], list: true },
  {
    name: "register CSV export",
    path: () => "/api/register/export.csv",
    as: "owner",
    connections: [1],
    list: true,
    streamed: true,
  },
  { name: "cylinders", path: () => "/api/cylinders", as: "tech", connections: [1, 10], list: true },
  { name: "cylinder detail", path: (ids) => `/api/cylinders/${ids.cylinderId}`, as: "tech", connections: [1] },
  // Casebook.
  { name: "casebook", path: () => "/api/cases", as: "tech", connections: [1], list: true },
  { name: "attempts", path: () => "/api/attempts", as: "tech", connections: [1], list: true },
  { name: "progress", path: () => "/api/attempts/progress", as: "tech", connections: [1], list: true },
  { name: "team progress", path: () => "/api/attempts/progress/team", as: "senior", connections: [1], list: true },
  // Everywhere: who is signed in, the company's settings, the people.
  { name: "me", path: () => "/api/auth/me", as: "tech", connections: [1] },
  { name: "organisation settings", path: () => "/api/organisation/settings", as: "tech", connections: [1] },
  { name: "members", path: () => "/api/members", as: "owner", connections: [1] },
];
