// Every page of the app as each demo account meets it, with the seeded demo data's real ids, for
// the walk in tests/e2e/readable.test.ts. The ids are the ones scripts/db/seed.ts writes into the
// fresh test database, in db/demo-data.json's order; each page names the heading it must show, so
// a page that moved shows up as a failure, never as a silent walk over "Not found".

export const TRIKE = {
  id: 1,
  name: "Square-wheel trike run",
  design: { id: 1, name: "Trike run track" },
  review: 1,
  plan: 1,
} as const;
export const SHAPES = {
  id: 2,
  name: "Rolling shapes table",
  design: { id: 2, name: "Hexagon lane" },
  review: 2,
} as const;
export const TWINS = { id: 3, name: "Window twins", design: { id: 3, name: "Street-window twins" } } as const;
type Project = typeof TRIKE | typeof SHAPES | typeof TWINS;

/** What a page must have drawn before it is audited (client-side work included). */
export type Ready = "heading" | "studio" | "review" | "cut" | "assembly";

export interface WalkPage {
  /** A short name for the report and for screenshots. */
  name: string;
  path: string;
  /** Text the page's first-level heading contains. */
  heading: string;
  status?: number;
  ready?: Ready;
  /** Keep a screenshot of it (the screen as first shown) for a person to look at. */
  screenshot?: boolean;
}

const NO_ACCESS = "Not available to your role";
const NOT_FOUND = "Not found";

const designPath = (p: Project) => `/projects/${p.id}/designs/${p.design.id}`;

export const pages = {
  login: (): WalkPage => ({ name: "sign-in", path: "/login", heading: "Axlewright" }),
  projects: (): WalkPage => ({ name: "projects", path: "/projects", heading: "Projects" }),
  project: (p: Project): WalkPage => ({ name: `project-${p.id}`, path: `/projects/${p.id}`, heading: p.name }),
  notMember: (p: Project): WalkPage => ({
    name: `project-${p.id}-not-member`,
    path: `/projects/${p.id}`,
    heading: NOT_FOUND,
    status: 404,
  }),
  missing: (): WalkPage => ({ name: "not-found", path: "/projects/999999", heading: NOT_FOUND, status: 404 }),
  newDesign: (p: Project, allowed: boolean): WalkPage => ({
    name: `new-design-${p.id}`,
    path: `/projects/${p.id}/designs/new`,
    heading: allowed ? "New design" : NO_ACCESS,
  }),
  studio: (p: Project): WalkPage => ({
    name: `studio-${p.design.id}`,
    path: designPath(p),
    heading: p.design.name,
    ready: "studio",
  }),
  revision: (p: Project): WalkPage => ({
    name: `revision-${p.design.id}-r1`,
    path: `${designPath(p)}?revision=1`,
    heading: p.design.name,
    ready: "studio",
  }),
  compare: (p: Project): WalkPage => ({
    name: `compare-${p.design.id}`,
    path: `${designPath(p)}/compare?a=1&b=1`,
    heading: `${p.design.name}: R1 and R1`,
  }),
  compareMissing: (p: Project): WalkPage => ({
    name: `compare-${p.design.id}-missing`,
    path: `${designPath(p)}/compare?a=1`,
    heading: "Compare revisions",
  }),
  cut: (p: Project, allowed: boolean): WalkPage =>
    allowed
      ? { name: `cut-${p.design.id}`, path: `${designPath(p)}/cut`, heading: p.design.name, ready: "cut" }
      : { name: `cut-${p.design.id}-no-access`, path: `${designPath(p)}/cut`, heading: NO_ACCESS },
  review: (p: typeof TRIKE | typeof SHAPES): WalkPage => ({
    name: `review-${p.review}`,
    path: `/projects/${p.id}/reviews/${p.review}`,
    heading: p.design.name,
    ready: "review",
  }),
  assembly: (): WalkPage => ({
    name: "assembly-sheet",
    path: `/projects/${TRIKE.id}/cut-plans/${TRIKE.plan}/assembly`,
    heading: "",
    ready: "assembly",
  }),
  log: (p: Project): WalkPage => ({ name: `log-${p.id}`, path: `/projects/${p.id}/log`, heading: p.name }),
  shop: (allowed: boolean): WalkPage => ({
    name: allowed ? "shop" : "shop-no-access",
    path: "/shop",
    heading: allowed ? "Shop library" : NO_ACCESS,
  }),
  people: (allowed: boolean): WalkPage => ({
    name: allowed ? "people" : "people-no-access",
    path: "/admin/users",
    heading: allowed ? "People" : NO_ACCESS,
  }),
  password: (): WalkPage => ({ name: "password", path: "/account/password", heading: "Change password" }),
};

/** The admin sees every project: every page of each, and every design's studio, revision and cut plan. */
function adminPages(): WalkPage[] {
  return [
    pages.projects(),
    ...[TRIKE, SHAPES, TWINS].map(pages.project),
    pages.newDesign(TRIKE, true),
    ...[TRIKE, SHAPES, TWINS].flatMap((p) => [
      pages.studio(p),
      { ...pages.revision(p), screenshot: p === TRIKE },
      { ...pages.cut(p, true), screenshot: p === TRIKE },
    ]),
    pages.compare(TRIKE),
    pages.compare(TWINS),
    pages.compareMissing(TRIKE),
    { ...pages.review(TRIKE), screenshot: true },
    pages.review(SHAPES),
    pages.assembly(),
    pages.log(TRIKE),
    pages.log(SHAPES),
    pages.shop(true),
    pages.people(true),
    pages.password(),
    pages.missing(),
  ];
}

/**
 * The projects' fabricator is shown the same design pages as the admin (both manage every demo
 * project), so each kind of page is walked once here, on the trike run; what differs by role
 * (the header, "Your role", People) is walked in full.
 */
function fabricatorPages(): WalkPage[] {
  return [
    pages.projects(),
    ...[TRIKE, SHAPES, TWINS].map(pages.project),
    pages.newDesign(TRIKE, true),
    pages.studio(TRIKE),
    pages.revision(TRIKE),
    pages.cut(TRIKE, true),
    pages.compare(TRIKE),
    pages.review(TRIKE),
    pages.assembly(),
    pages.log(TRIKE),
    pages.shop(true),
    pages.people(false),
    pages.password(),
  ];
}

export interface WalkAccount {
  label: string;
  /** The demo account, or null for a visitor who has not signed in. */
  email: string | null;
  pages: WalkPage[];
}

export const WALK: WalkAccount[] = [
  { label: "a visitor", email: null, pages: [pages.login()] },
  { label: "the admin", email: "admin@example.test", pages: adminPages() },
  { label: "the fabricator", email: "fabricator@example.test", pages: fabricatorPages() },
  {
    label: "the client",
    email: "client@example.test",
    pages: [
      pages.projects(),
      pages.project(TRIKE),
      pages.project(SHAPES),
      pages.notMember(TWINS),
      pages.newDesign(TRIKE, false),
      pages.studio(TRIKE),
      pages.studio(SHAPES),
      pages.revision(TRIKE),
      pages.compare(TRIKE),
      pages.cut(TRIKE, false),
      pages.review(TRIKE),
      pages.review(SHAPES),
      pages.assembly(),
      pages.log(TRIKE),
      { ...pages.shop(false), screenshot: true },
      pages.people(false),
      pages.password(),
      pages.missing(),
    ],
  },
  {
    label: "the installer",
    email: "installer@example.test",
    pages: [
      pages.projects(),
      pages.project(TRIKE),
      pages.notMember(SHAPES),
      pages.studio(TRIKE),
      pages.revision(TRIKE),
      pages.cut(TRIKE, false),
      pages.review(TRIKE),
      pages.assembly(),
      pages.log(TRIKE),
      pages.shop(false),
      pages.people(false),
      pages.password(),
    ],
  },
  {
    label: "the gallery's client",
    email: "gallery@example.test",
    pages: [
      pages.projects(),
      pages.project(TWINS),
      pages.notMember(TRIKE),
      pages.newDesign(TWINS, false),
      pages.studio(TWINS),
      pages.revision(TWINS),
      pages.compare(TWINS),
      pages.log(TWINS),
      pages.shop(false),
      pages.password(),
    ],
  },
];
