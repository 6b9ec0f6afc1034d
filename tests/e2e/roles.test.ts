// Each demo role signs in and sees what that role should see, and not the rest.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ProjectsPage } from "./pages/projects-page";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
import { signedIn } from "./support/session";
import { ROLE_LABELS } from "@/lib/labels";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const TRIKE = "Square-wheel trike run";
const SHAPES = "Rolling shapes table";
const TWINS = "Window twins";

const ROLES = [
  {
    email: "admin@example.test",
    role: "admin",
    projects: [TRIKE, SHAPES, TWINS],
    people: true,
    create: true,
    manage: true,
  },
  {
    email: "fabricator@example.test",
    role: "fabricator",
    projects: [TRIKE, SHAPES, TWINS],
    people: false,
    create: true,
    manage: true,
  },
  {
    email: "client@example.test",
    role: "client",
    projects: [TRIKE, SHAPES],
    people: false,
    create: false,
    manage: false,
  },
  {
    email: "installer@example.test",
    role: "installer",
    projects: [TRIKE],
    people: false,
    create: false,
    manage: false,
  },
  { email: "gallery@example.test", role: "client", projects: [TWINS], people: false, create: false, manage: false },
];

describe.each(ROLES)("signed in as $email", (r) => {
  it("sees exactly their projects, and the tools of their role", async () => {
    const { context, page } = await signedIn(browser, r.email);
    const projects = new ProjectsPage(page);
    await projects.waitUntilShown();
    expect(await projects.currentUser().innerText()).toContain(ROLE_LABELS[r.role as keyof typeof ROLE_LABELS]);
    const names = await projects.projectNames();
    // An admin sees every project (other tests add some); everyone else exactly their own.
    if (r.role === "admin") expect(names).toEqual(expect.arrayContaining(r.projects));
    else expect(names.sort()).toEqual([...r.projects].sort());
    expect(await projects.peopleLink().count()).toBe(r.people ? 1 : 0);
    expect(await projects.newProjectPanel().count()).toBe(r.create ? 1 : 0);
    await page.screenshot({ path: screenshotPath(`projects-${r.email.split("@")[0]}`), fullPage: true });

    await page.getByRole("link", { name: r.projects[0] }).click();
    await page.getByRole("heading", { name: r.projects[0], level: 1 }).waitFor();
    await page.getByRole("heading", { name: "Members" }).waitFor();
    expect(await page.getByRole("button", { name: "Add member" }).count()).toBe(r.manage ? 1 : 0);
    await page.screenshot({ path: screenshotPath(`project-${r.email.split("@")[0]}`), fullPage: true });

    // A project they do not belong to is simply not there.
    const others = [TRIKE, SHAPES, TWINS].filter((p) => !r.projects.includes(p));
    if (others.length > 0) {
      const id = others[0] === TRIKE ? 1 : others[0] === SHAPES ? 2 : 3;
      const response = await page.goto(`${baseUrl}/projects/${id}`);
      expect(response?.status()).toBe(404);
      await page.getByRole("heading", { name: "Not found" }).waitFor();
    }

    const admin = await page.goto(`${baseUrl}/admin/users`);
    expect(admin?.status()).toBe(200);
    if (r.people) await page.getByRole("heading", { name: "People", level: 1 }).waitFor();
    else await page.getByRole("heading", { name: "Not available to your role" }).waitFor();
    await context.close();
  });
});
