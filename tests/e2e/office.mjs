// End-to-end: the office page in Debian's Chromium. A device's store (the demo inspection,
// a delivered report) is synced by `undercroft sync` to `undercroft-server` on a database of
// this test's own in the PostgreSQL cluster `scripts/with-postgres` started; then office
// staff sign in with a token, search by address, client, date, inspector and finding words,
// open the inspection's findings and download its delivered PDF; an inspector with nothing
// sent sees nothing, and a revoked token is refused. Last, the phone app's settings screen
// sends another device's finished inspection and shows the firm's settings it took.
//
// Usage: node office.mjs   (env UNDERCROFT_TEST_DATABASE_URL: an admin URL of a running
// cluster; UNDERCROFT_BIN: the folder of the built binaries, default target/debug;
// CHROMIUM: the browser). Screenshots go to target/e2e-screens/office-*.png.

import { chromium } from "playwright-core";
import { execFileSync } from "node:child_process";
import { startListening } from "./listening.mjs";
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import assert from "node:assert/strict";

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const bin = process.env.UNDERCROFT_BIN ?? path.join(repo, "target/debug");
const browserPath = process.env.CHROMIUM ?? "/usr/bin/chromium";
const admin = process.env.UNDERCROFT_TEST_DATABASE_URL;
if (!admin) {
  console.error("UNDERCROFT_TEST_DATABASE_URL is not set: run this under scripts/with-postgres");
  process.exit(2);
}
const shots = path.join(repo, "target/e2e-screens");
fs.mkdirSync(shots, { recursive: true });
const work = fs.mkdtempSync(path.join(os.tmpdir(), "undercroft-office-e2e-"));
const dbName = `office_e2e_${process.pid}`;
const dbUrl = admin.replace(/\/[^/?]*(\?|$)/, `/${dbName}$1`);
const files = path.join(work, "files");
const store = path.join(work, "device.sqlite");

const psql = (sql) => execFileSync("psql", ["-q", "-v", "ON_ERROR_STOP=1", admin, "-c", sql]);
const server = (...args) =>
  execFileSync(path.join(bin, "undercroft-server"), ["--database-url", dbUrl, "--files", files, ...args], {
    encoding: "utf8",
    stdio: ["ignore", "pipe", "pipe"],
  }).trim();
const undercroft = (...args) =>
  execFileSync(path.join(bin, "undercroft"), ["--db", store, ...args], { encoding: "utf8" }).trim();

let running = null;
let appProc = null;

/** The office server on a free loopback port; resolves with its address. */
async function serve() {
  const started = startListening(path.join(bin, "undercroft-server"), ["--database-url", dbUrl, "--files", files, "serve", "--listen", "127.0.0.1:0"], "the office server");
  running = started.proc;
  return (await started.ready).url;
}

/** The phone app (liveview) on a store; resolves with { proc, url }. */
function startApp(db) {
  const started = startListening(path.join(bin, "undercroft-liveview"), ["--db", db], "the app");
  appProc = started.proc;
  return started.ready;
}

let shotCount = 0;
async function shot(page, name) {
  shotCount += 1;
  const file = path.join(shots, `office-${String(shotCount).padStart(2, "0")}-${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  console.log(`  screenshot ${path.relative(repo, file)}`);
}

async function search(page, url, fields) {
  await page.goto(`${url}/office`);
  for (const [name, value] of Object.entries(fields)) {
    await page.locator(`form.search input[name="${name}"]`).fill(value);
  }
  await page.getByRole("button", { name: "Search" }).click();
  await page.waitForLoadState("domcontentloaded");
}

const found = (page) => page.locator("#found tr.found").count();

async function main() {
  psql(`DROP DATABASE IF EXISTS ${dbName}`);
  psql(`CREATE DATABASE ${dbName}`);
  server("migrate");
  const desk = server("issue-token", "--name", "Front Desk", "--role", "office");
  const ana = server("issue-token", "--name", "Ana Ruiz", "--role", "inspector");
  const ben = server("issue-token", "--name", "Ben Okafor", "--role", "inspector");
  const url = await serve();

  console.log("device: the demo inspection delivered and synced");
  const id = undercroft("import", path.join(repo, "demo-data/demo-inspection.json")).match(/^imported (\S+)/)[1];
  const pdfPath = path.join(work, "report.pdf");
  undercroft("report", "--inspection", id, "--output", pdfPath, "--to", "Dana Whitlock");
  const said = undercroft("sync", "--office", url, "--token", ana);
  assert.match(said, /1 sent/);
  const delivered = fs.readFileSync(pdfPath);

  const browser = await chromium.launch({
    executablePath: browserPath,
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic"],
  });
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  const page = await context.newPage();
  page.setDefaultTimeout(30000);

  console.log("office: sign in");
  await page.goto(`${url}/office`);
  await page.getByRole("heading", { name: "Sign in" }).waitFor();
  await shot(page, "sign-in");
  await page.locator('input[name="token"]').fill("uct_not_a_real_token");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("alert").waitFor();
  await page.locator('input[name="token"]').fill(desk);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("heading", { name: "Archive" }).waitFor();
  assert.equal(await found(page), 1);
  await shot(page, "archive");

  console.log("office: search by address, client, inspector, date and finding");
  const demo = JSON.parse(fs.readFileSync(path.join(repo, "demo-data/demo-inspection.json"), "utf8"));
  const street = demo.property.address.split(",")[0].split(" ").slice(1).join(" ");
  for (const [fields, expected] of [
    [{ address: street.toUpperCase() }, 1],
    [{ address: "no such street" }, 0],
    [{ client: demo.client.name.split(" ")[0] }, 1],
    [{ inspector: "Ana" }, 1],
    [{ inspector: "Ben" }, 0],
    [{ from: demo.date, to: demo.date }, 1],
    [{ from: "2001-01-01", to: "2001-12-31" }, 0],
    [{ finding: "decay at a bearing" }, 1],
    [{ finding: "termite shelter tubes" }, 0],
  ]) {
    await search(page, url, fields);
    assert.equal(await found(page), expected, `search ${JSON.stringify(fields)}`);
  }
  await search(page, url, { finding: "decay at a bearing" });
  const matching = await page.locator("#found").innerText();
  assert.match(matching, /Decay|decay/);
  await shot(page, "finding-search");

  console.log("office: open the inspection's findings and download its report");
  await page.locator("#found a").first().click();
  await page.getByRole("heading", { name: demo.property.address }).waitFor();
  const findings = await page.locator("#findings tr.finding").count();
  assert.ok(findings > 50, `the findings are listed (${findings})`);
  assert.match(await page.locator(".notice").innerText(), /Screening tool/);
  assert.match(await page.locator("main").innerText(), /Dana Whitlock/);
  await shot(page, "inspection");
  const [download] = await Promise.all([page.waitForEvent("download"), page.locator("a.download").first().click()]);
  const got = fs.readFileSync(await download.path());
  assert.equal(got.subarray(0, 5).toString(), "%PDF-");
  assert.equal(crypto.createHash("sha256").update(got).digest("hex"), crypto.createHash("sha256").update(delivered).digest("hex"), "the PDF is the one delivered");

  console.log("office: firm settings");
  await page.getByRole("link", { name: "Firm settings" }).click();
  await page.locator('input[name="company"]').fill("Lantern Hill Inspections");
  // An edition the engine does not know is refused in words, and nothing typed is lost.
  await page.locator('textarea[name="counties"]').fill("Marrow County | IRC 1990 | No notches in the middle third");
  await page.getByRole("button", { name: "Save" }).click();
  await page.getByRole("alert").waitFor();
  assert.match(await page.getByRole("alert").innerText(), /IRC 1990/);
  assert.equal(await page.locator('input[name="company"]').inputValue(), "Lantern Hill Inspections");
  await page.locator('textarea[name="counties"]').fill("Marrow County | IRC 2021 | No notches in the middle third");
  await page.getByRole("button", { name: "Save" }).click();
  await page.getByText("Saved.").waitFor();
  await shot(page, "settings");
  assert.match(undercroft("sync"), /the firm's settings taken/);

  console.log("office: issue a token from the page, then revoke it");
  await page.getByRole("link", { name: "People" }).click();
  await page.locator('form.settings input[name="name"]').fill("Cara Lind");
  await page.getByRole("button", { name: "Issue a token" }).click();
  const cara = (await page.locator("#issued-token").innerText()).trim();
  assert.match(cara, /^uct_[0-9a-f]{16}_[0-9a-f]{64}$/);
  const listAs = async (token) => (await fetch(`${url}/api/v1/inspections`, { headers: { Authorization: `Bearer ${token}` } })).status;
  assert.equal(await listAs(cara), 200);
  assert.equal(await page.locator("#tokens tr.token").count(), 4, "three from the command line, one from the page");
  await shot(page, "people");
  await page.getByRole("button", { name: /Revoke Cara Lind's token/ }).click();
  await page.getByText("revoked: it no longer works").waitFor();
  assert.equal(await listAs(cara), 401, "a revoked token stops at once");
  assert.doesNotMatch(await page.locator("main").innerText(), new RegExp(cara.slice(21)), "the secret is shown once only");

  console.log("office: an inspector with nothing sent sees nothing; a revoked token is refused");
  await page.getByRole("button", { name: "Sign out" }).click();
  await page.locator('input[name="token"]').fill(ben);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.locator("#none-found").waitFor();
  assert.equal(await page.getByRole("link", { name: "Firm settings" }).count(), 0);
  assert.equal((await page.goto(`${url}/office/people`)).status(), 403, "people and tokens are the office's");
  const direct = await page.goto(`${url}/office/inspections/${id}`);
  assert.equal(direct.status(), 404);
  server("revoke-token", ben.slice(4, 20));
  await page.goto(`${url}/office`);
  await page.getByText("no longer valid").waitFor();
  await shot(page, "revoked");

  console.log("app: the settings screen sends a finished inspection to the office");
  const tablet = path.join(work, "tablet.sqlite");
  const onTablet = (...args) => execFileSync(path.join(bin, "undercroft"), ["--db", tablet, ...args], { encoding: "utf8" }).trim();
  const copyId = onTablet("import", "--as-copy", path.join(repo, "demo-data/demo-inspection.json")).match(/^imported (\S+)/)[1];
  onTablet("report", "--inspection", copyId, "--output", path.join(work, "tablet.pdf"), "--to", "Dana Whitlock");
  const app = await startApp(tablet);
  const phone = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  const screen = await phone.newPage();
  screen.setDefaultTimeout(30000);
  await screen.goto(`${app.url}/settings`);
  await screen.locator("#office-url").fill(url);
  await screen.locator("#office-token").fill(ana);
  await screen.locator("#office-sync").tap();
  const outcome = screen.locator("#office-outcome");
  await outcome.waitFor();
  assert.match(await outcome.innerText(), /^1 sent; 0 already at the office/);
  await screen.locator("#firm-settings").waitFor();
  assert.match(await screen.locator("#firm-settings").innerText(), /Lantern Hill Inspections/);
  await screen.screenshot({ path: path.join(shots, "office-07-app-sync.png"), fullPage: true });
  await screen.locator("#office-sync").tap();
  await screen.getByText("0 sent; 1 already at the office").waitFor();

  console.log("app: a report delivered while the office is set is sent by itself");
  await screen.goto(`${app.url}/inspection/${copyId}/report`);
  await screen.locator("#build-report").tap();
  await screen.locator("#report-path").waitFor({ timeout: 120000 });
  const revisions = async () => {
    const answer = await fetch(`${url}/api/v1/inspections/${copyId}`, { headers: { Authorization: `Bearer ${ana}` } });
    return (await answer.json()).revisions.length;
  };
  for (let n = 0; n < 300 && (await revisions()) < 2; n++) await new Promise((r) => setTimeout(r, 100));
  assert.equal(await revisions(), 2, "the new delivery reached the office as a second revision");
  // Opening the app again sends by itself too: nothing new by now, and it says so.
  await screen.goto(`${app.url}/settings`);
  await screen.getByText("1 already at the office").waitFor();
  assert.match(await screen.locator("#office-last").innerText(), /^Last sent \d{4}-\d{2}-\d{2} \d{2}:\d{2} .*: 0 sent; 1 already at the office/);
  app.proc.kill("SIGKILL");

  await browser.close();
  running.removeAllListeners("exit");
  running.kill("SIGTERM");
  psql(`DROP DATABASE IF EXISTS ${dbName} WITH (FORCE)`);
  fs.rmSync(work, { recursive: true, force: true });
  console.log(`office page passed (${shotCount} screenshots)`);
}

main().catch((e) => {
  console.error(e);
  if (running) running.kill("SIGKILL");
  if (appProc) appProc.kill("SIGKILL");
  process.exit(1);
});
