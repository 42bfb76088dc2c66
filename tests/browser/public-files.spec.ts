/**
 * What public/ holds is served from the site root by the running app, as a plain file, with the same security
 * headers as every other answer — and the app's icon (app/icon.svg) is still served beside it.
 */
import { readFile } from "node:fs/promises";
import { expect, test } from "@playwright/test";

test("robots.txt comes from public/ and keeps every page out of search engines", async ({ request }) => {
  const res = await request.get("/robots.txt");
  expect(res.status()).toBe(200);
  expect(res.headers()["content-type"]).toMatch(/^text\/plain/);
  expect(res.headers()["x-content-type-options"]).toBe("nosniff");
  const body = await res.text();
  expect(body).toBe(await readFile("public/robots.txt", "utf8"));
  expect(body).toMatch(/^User-agent: \*$/m);
  expect(body).toMatch(/^Disallow: \/$/m);
});

test("the app icon is still served, and the sign-in page links it", async ({ page, request }) => {
  await page.goto("/sign-in");
  const href = await page.locator('link[rel="icon"]').first().getAttribute("href");
  expect(href).toMatch(/^\/icon\.svg/);
  const icon = await request.get(href!);
  expect(icon.status()).toBe(200);
  expect(icon.headers()["content-type"]).toMatch(/^image\/svg\+xml/);
  expect(await icon.text()).toBe(await readFile("app/icon.svg", "utf8"));
});
