/**
 * Tenancy and roles, as a table: every org-scoped route handler × every role ×
 * a member of another organisation × signed out. Allowed calls succeed; refused ones answer
 * 401 (signed out), 404 (not your organisation — indistinguishable from "no such org") or 403 (your
 * role), and a refused call leaves every tenant table exactly as it was.
 */
import { beforeEach, describe, expect, it } from "vitest";
import type { Role } from "@/db/schema";
import * as projectsRoute from "@/app/api/orgs/[orgSlug]/projects/route";
import * as projectRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/route";
import * as membersRoute from "@/app/api/orgs/[orgSlug]/members/route";
import * as memberRoute from "@/app/api/orgs/[orgSlug]/members/[memberId]/route";
import * as invitationsRoute from "@/app/api/orgs/[orgSlug]/invitations/route";
import * as invitationRoute from "@/app/api/orgs/[orgSlug]/invitations/[invitationId]/route";
import * as unitTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/unit-types/route";
import * as unitTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/unit-types/[unitTypeId]/route";
import * as sheetsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/sheets/route";
import * as sheetRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/sheets/[sheetId]/route";
import * as openingTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/route";
import * as openingTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/[openingTypeId]/route";
import * as tagsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/tags/route";
import * as tagRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/tags/[tagId]/route";
import * as countsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/counts/route";
import * as planSetRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId]/route";
import * as planSetsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/plan-sets/route";
import * as priceGapsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/price-gaps/route";
import * as priceBooksRoute from "@/app/api/orgs/[orgSlug]/price-books/route";
import * as priceBookRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/route";
import * as priceBookItemsRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/route";
import * as priceBookItemRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/[itemId]/route";
import * as priceBookCsvRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/csv/route";
import * as priceBookChangesRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/changes/route";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg, unique, type World } from "./helpers/world";

type Actor = Role | "outsider" | "anonymous";
const actors: Actor[] = ["admin", "estimator", "project_manager", "outsider", "anonymous"];

interface RouteCase {
  name: string;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  handler: (req: any, ctx: any) => Promise<Response>;
  method: string;
  params: (w: World) => Record<string, string>;
  body?: (w: World) => unknown;
  allowed: Role[];
  okStatus: number;
  /** The request path, where the handler reads the query string (e.g. `?version=1`). */
  path?: string;
}

const org = (w: World) => ({ orgSlug: w.org.slug });
const routes: RouteCase[] = [
  { name: "list projects", handler: projectsRoute.GET, method: "GET", params: org, allowed: ["admin", "estimator", "project_manager"], okStatus: 200 },
  { name: "create project", handler: projectsRoute.POST, method: "POST", params: org, body: () => ({ name: `Alder Yard ${unique()}` }), allowed: ["admin", "estimator"], okStatus: 201 },
  { name: "read project", handler: projectRoute.GET, method: "GET", params: (w) => ({ ...org(w), projectId: w.project.id }), allowed: ["admin", "estimator", "project_manager"], okStatus: 200 },
  { name: "update project", handler: projectRoute.PATCH, method: "PATCH", params: (w) => ({ ...org(w), projectId: w.project.id }), body: () => ({ name: "Renamed" }), allowed: ["admin", "estimator"], okStatus: 200 },
  { name: "archive project", handler: projectRoute.PATCH, method: "PATCH", params: (w) => ({ ...org(w), projectId: w.project.id }), body: () => ({ archived: true }), allowed: ["admin", "estimator"], okStatus: 200 },
  { name: "list members", handler: membersRoute.GET, method: "GET", params: org, allowed: ["admin", "estimator", "project_manager"], okStatus: 200 },
  { name: "change a role", handler: memberRoute.PATCH, method: "PATCH", params: (w) => ({ ...org(w), memberId: w.spare.membershipId }), body: () => ({ role: "project_manager" }), allowed: ["admin"], okStatus: 200 },
  { name: "remove a member", handler: memberRoute.DELETE, method: "DELETE", params: (w) => ({ ...org(w), memberId: w.spare.membershipId }), allowed: ["admin"], okStatus: 204 },
  { name: "list invitations", handler: invitationsRoute.GET, method: "GET", params: org, allowed: ["admin"], okStatus: 200 },
  { name: "invite", handler: invitationsRoute.POST, method: "POST", params: org, body: () => ({ email: `new-${unique()}@example.test`, role: "estimator" }), allowed: ["admin"], okStatus: 201 },
  { name: "withdraw an invitation", handler: invitationRoute.DELETE, method: "DELETE", params: (w) => ({ ...org(w), invitationId: w.invitation.id }), allowed: ["admin"], okStatus: 204 },
];

const proj = (w: World) => ({ ...org(w), projectId: w.project.id });
const readers: Role[] = ["admin", "estimator", "project_manager"];
const writers: Role[] = ["admin", "estimator"];
routes.push(
  { name: "list unit types", handler: unitTypesRoute.GET, method: "GET", params: proj, allowed: readers, okStatus: 200 },
  { name: "add a unit type", handler: unitTypesRoute.POST, method: "POST", params: proj, body: () => ({ name: `Type B ${unique()}`, count: 4 }), allowed: writers, okStatus: 201 },
  { name: "edit a unit type", handler: unitTypeRoute.PATCH, method: "PATCH", params: (w) => ({ ...proj(w), unitTypeId: w.plans.unitType.id }), body: () => ({ version: 1, count: 30 }), allowed: writers, okStatus: 200 },
  { name: "delete a unit type", handler: unitTypeRoute.DELETE, method: "DELETE", path: "/api/x?version=1", params: (w) => ({ ...proj(w), unitTypeId: w.plans.unitType.id }), allowed: writers, okStatus: 204 },
  { name: "list sheets", handler: sheetsRoute.GET, method: "GET", params: proj, allowed: readers, okStatus: 200 },
  { name: "read a sheet", handler: sheetRoute.GET, method: "GET", params: (w) => ({ ...proj(w), sheetId: w.plans.sheet.id }), allowed: readers, okStatus: 200 },
  { name: "calibrate a sheet", handler: sheetRoute.PATCH, method: "PATCH", params: (w) => ({ ...proj(w), sheetId: w.plans.sheet.id }), body: () => ({ version: 1, scale: { ratio: 48, label: '1/4" = 1\'-0"' } }), allowed: writers, okStatus: 200 },
  { name: "list opening types", handler: openingTypesRoute.GET, method: "GET", params: proj, allowed: readers, okStatus: 200 },
  { name: "add an opening type", handler: openingTypesRoute.POST, method: "POST", params: proj, body: () => ({ mark: "W9", width: "35 1/2", height: "59 1/2", setback: "9/16" }), allowed: writers, okStatus: 201 },
  { name: "edit an opening type", handler: openingTypeRoute.PATCH, method: "PATCH", params: (w) => ({ ...proj(w), openingTypeId: w.plans.w1.id }), body: () => ({ version: 1, width: "36 1/4" }), allowed: writers, okStatus: 200 },
  { name: "delete an opening type", handler: openingTypeRoute.DELETE, method: "DELETE", path: "/api/x?version=1", params: (w) => ({ ...proj(w), openingTypeId: w.plans.w2.id }), allowed: writers, okStatus: 204 },
  { name: "list tags", handler: tagsRoute.GET, method: "GET", params: proj, allowed: readers, okStatus: 200 },
  { name: "place a tag", handler: tagsRoute.POST, method: "POST", params: proj, body: (w) => ({ sheetId: w.plans.sheet.id, openingTypeId: w.plans.w2.id, x: 10, y: 20 }), allowed: writers, okStatus: 201 },
  { name: "move a tag", handler: tagRoute.PATCH, method: "PATCH", params: (w) => ({ ...proj(w), tagId: w.plans.tag.id }), body: () => ({ version: 1, x: 500, y: 320 }), allowed: writers, okStatus: 200 },
  { name: "delete a tag", handler: tagRoute.DELETE, method: "DELETE", path: "/api/x?version=1", params: (w) => ({ ...proj(w), tagId: w.plans.tag.id }), allowed: writers, okStatus: 204 },
  { name: "read counts", handler: countsRoute.GET, method: "GET", params: proj, allowed: readers, okStatus: 200 },
  { name: "delete a sheet", handler: sheetRoute.DELETE, method: "DELETE", path: "/api/x?version=1", params: (w) => ({ ...proj(w), sheetId: w.plans.commonSheet.id }), allowed: writers, okStatus: 204 },
  { name: "list plan sets", handler: planSetsRoute.GET, method: "GET", params: proj, allowed: readers, okStatus: 200 },
  { name: "delete a plan set", handler: planSetRoute.DELETE, method: "DELETE", path: "/api/x?tags=1", params: (w) => ({ ...proj(w), planSetId: w.plans.planSetId }), allowed: writers, okStatus: 204 },
  { name: "check the window list against a price book", handler: priceGapsRoute.GET, method: "GET", params: proj, allowed: readers, okStatus: 200 },
);

const book = (w: World) => ({ ...org(w), priceBookId: w.priceBook.book.id });
const admins: Role[] = ["admin"];
const importCsv = `name,kind,face_width,thickness,species,supplier_code,price 8'\nApron 3 1/2,apron,3 1/2,11/16,Poplar,,12.40\n`;
routes.push(
  { name: "list price books", handler: priceBooksRoute.GET, method: "GET", params: org, allowed: readers, okStatus: 200 },
  { name: "create a price book", handler: priceBooksRoute.POST, method: "POST", params: org, body: () => ({ name: `Spring ${unique()}` }), allowed: admins, okStatus: 201 },
  { name: "read a price book", handler: priceBookRoute.GET, method: "GET", params: book, allowed: readers, okStatus: 200 },
  { name: "edit a price book", handler: priceBookRoute.PATCH, method: "PATCH", params: book, body: () => ({ version: 1, markup: 0.2 }), allowed: admins, okStatus: 200 },
  { name: "delete a price book", handler: priceBookRoute.DELETE, method: "DELETE", path: "/api/x?version=1", params: book, allowed: admins, okStatus: 204 },
  { name: "add a price-book item", handler: priceBookItemsRoute.POST, method: "POST", params: book, body: () => ({ name: "Apron 3 1/2", kind: "apron", faceWidth: "3 1/2", thickness: "11/16", stock: [{ length: "8'", price: 12.4 }] }), allowed: admins, okStatus: 201 },
  { name: "edit a price-book item", handler: priceBookItemRoute.PATCH, method: "PATCH", params: (w) => ({ ...book(w), itemId: w.priceBook.item.id }), body: () => ({ version: 1, stock: [{ length: "8'", price: "10.60" }] }), allowed: admins, okStatus: 200 },
  { name: "delete a price-book item", handler: priceBookItemRoute.DELETE, method: "DELETE", path: "/api/x?version=1", params: (w) => ({ ...book(w), itemId: w.priceBook.spareItem.id }), allowed: admins, okStatus: 204 },
  { name: "export a price book as CSV", handler: priceBookCsvRoute.GET, method: "GET", params: book, allowed: readers, okStatus: 200 },
  { name: "preview a CSV import", handler: priceBookCsvRoute.POST, method: "POST", params: book, body: () => ({ csv: importCsv, mode: "merge", apply: false }), allowed: admins, okStatus: 200 },
  { name: "apply a CSV import", handler: priceBookCsvRoute.POST, method: "POST", params: book, body: () => ({ csv: importCsv, mode: "merge", apply: true }), allowed: admins, okStatus: 200 },
  { name: "read a price book's change log", handler: priceBookChangesRoute.GET, method: "GET", params: book, allowed: readers, okStatus: 200 },
);

const expectedRefusal = (actor: Actor) => (actor === "anonymous" ? 401 : actor === "outsider" ? 404 : 403);

let home: World;
let other: World;
beforeEach(async () => {
  home = await makeOrg("Cedarline");
  other = await makeOrg("Foxglove");
});

function cookieFor(actor: Actor) {
  if (actor === "anonymous") return Promise.resolve(undefined);
  // The outsider is the other organisation's admin: fully privileged, but not here.
  const person = actor === "outsider" ? other.people.admin : home.people[actor];
  return sessionCookie(person);
}

describe.each(routes)("route: $name", (route) => {
  it.each(actors)("as %s", async (actor) => {
    const allowed = actor !== "anonymous" && actor !== "outsider" && route.allowed.includes(actor);
    const before = await snapshot();
    const res = await call(route.handler, {
      method: route.method,
      path: route.path ?? "/api/x",
      params: route.params(home),
      body: route.body?.(home),
      cookie: await cookieFor(actor),
    });
    if (allowed) {
      expect(res.status).toBe(route.okStatus);
    } else {
      expect(res.status).toBe(expectedRefusal(actor));
      expect(res.json?.error).toEqual(expect.any(String));
      expect(await snapshot()).toBe(before);
    }
  });
});

const byName = (name: string) => routes.find((r) => r.name === name)!;

describe("ids from another organisation, through your own slug", () => {
  const foreign: { name: string; route: RouteCase }[] = [
    { name: "read their project", route: { ...routes[2]!, params: (w) => ({ ...org(w), projectId: other.project.id }) } },
    { name: "update their project", route: { ...routes[3]!, params: (w) => ({ ...org(w), projectId: other.project.id }) } },
    { name: "change their member's role", route: { ...routes[6]!, params: (w) => ({ ...org(w), memberId: other.spare.membershipId }) } },
    { name: "remove their member", route: { ...routes[7]!, params: (w) => ({ ...org(w), memberId: other.spare.membershipId }) } },
    { name: "withdraw their invitation", route: { ...routes[10]!, params: (w) => ({ ...org(w), invitationId: other.invitation.id }) } },
    { name: "list their project's sheets", route: { ...byName("list sheets"), params: (w) => ({ ...org(w), projectId: other.project.id }) } },
    { name: "read their sheet", route: { ...byName("read a sheet"), params: (w) => ({ ...proj(w), sheetId: other.plans.sheet.id }) } },
    { name: "calibrate their sheet", route: { ...byName("calibrate a sheet"), params: (w) => ({ ...proj(w), sheetId: other.plans.sheet.id }) } },
    { name: "edit their unit type", route: { ...byName("edit a unit type"), params: (w) => ({ ...proj(w), unitTypeId: other.plans.unitType.id }) } },
    { name: "edit their opening type", route: { ...byName("edit an opening type"), params: (w) => ({ ...proj(w), openingTypeId: other.plans.w1.id }) } },
    { name: "move their tag", route: { ...byName("move a tag"), params: (w) => ({ ...proj(w), tagId: other.plans.tag.id }) } },
    { name: "delete their tag", route: { ...byName("delete a tag"), params: (w) => ({ ...proj(w), tagId: other.plans.tag.id }) } },
    { name: "read their counts", route: { ...byName("read counts"), params: (w) => ({ ...org(w), projectId: other.project.id }) } },
    ...[
      "read a price book",
      "edit a price book",
      "delete a price book",
      "add a price-book item",
      "export a price book as CSV",
      "preview a CSV import",
      "apply a CSV import",
      "read a price book's change log",
    ].map((name) => ({ name: `${name}: theirs`, route: { ...byName(name), params: (w: World) => ({ ...org(w), priceBookId: other.priceBook.book.id }) } })),
    { name: "edit their item in their book", route: { ...byName("edit a price-book item"), params: (w) => ({ ...org(w), priceBookId: other.priceBook.book.id, itemId: other.priceBook.item.id }) } },
    { name: "edit their item through your book", route: { ...byName("edit a price-book item"), params: (w) => ({ ...book(w), itemId: other.priceBook.item.id }) } },
    { name: "delete their item through your book", route: { ...byName("delete a price-book item"), params: (w) => ({ ...book(w), itemId: other.priceBook.spareItem.id }) } },
  ];
  it.each(foreign)("$name → 404, nothing changed", async ({ route }) => {
    const before = await snapshot();
    const res = await call(route.handler, {
      method: route.method,
      path: route.path ?? "/api/x",
      params: route.params(home),
      body: route.body?.(home),
      cookie: await sessionCookie(home.people.admin),
    });
    expect(res.status).toBe(404);
    expect(await snapshot()).toBe(before);
  });
});
