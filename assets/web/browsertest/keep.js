// The storage scenario of the browser test, in headless Chromium at phone
// size with touch: save a named setup of Working gas from the keep bar and
// log a result with a note; reload and find both; reload offline and find
// them again; export everything (a download), start with empty site
// storage, import the file (the file picker) and find them back.
//
// keepScenario({ browser, url, phone, check, shots }) runs it; run.js
// calls it after its own checks. The app draws into one canvas, so the
// script taps places of the phone layout (the keep bar at the foot of a
// calculator, the setups panel, the Saved work buttons) and reads the
// stored documents from IndexedDB, as the app keeps them.
"use strict";
const { column } = require("./pixels.js");
const fs = require("fs");
const path = require("path");

const NAME = "12 bar He-Ar rig";
const NOTE = "first light";

// Colours of the app's palette (ui/theme.go) that mark places on screen.
const SURFACE = [0xff, 0xff, 0xff];
const ACCENT = [0x23, 0x63, 0x6b];
const SELECTED = [0xd6, 0xe8, 0xe9];


const near = (a, b) => a.every((v, i) => Math.abs(v - b[i]) <= 3);

// bands returns the runs of at least min pixels of colour c (or of any of
// the colours in a list) in col, from y0 down, as [top, bottom] pairs.
function bands(col, c, y0 = 60, min = 30) {
  const cs = Array.isArray(c[0]) ? c : [c];
  const out = [];
  let top = -1;
  for (let y = y0; y <= col.length; y++) {
    const on = y < col.length && cs.some((k) => near(col[y], k));
    if (on && top < 0) top = y;
    if (!on && top >= 0) {
      if (y - top >= min) out.push([top, y - 1]);
      top = -1;
    }
  }
  return out;
}

// stored reads a document of the app's IndexedDB ("" when missing).
function stored(page, name) {
  return page.evaluate((name) => new Promise((ok, fail) => {
    const req = indexedDB.open("tubewright", 1);
    req.onerror = () => fail(req.error);
    req.onsuccess = () => {
      const db = req.result;
      if (!db.objectStoreNames.contains("docs")) { db.close(); ok(""); return; }
      const get = db.transaction("docs", "readonly").objectStore("docs").get(name);
      get.onsuccess = () => { db.close(); ok(get.result || ""); };
      get.onerror = () => { db.close(); fail(get.error); };
    };
  }), name);
}

async function firstFrame(page) {
  await page.waitForFunction(() => performance.getEntriesByName("tw-first-frame").length > 0, null, { timeout: 60000 });
  await page.waitForTimeout(1500);
}

// until polls f (async, returning a truthy value when done) for up to
// 10 s and returns its last value: the app writes off its UI goroutine.
async function until(page, f) {
  let v;
  for (let i = 0; i < 40; i++) {
    if ((v = await f())) return v;
    await page.waitForTimeout(250);
  }
  return v;
}

async function tap(page, x, y, wait = 800) {
  await page.touchscreen.tap(x, y);
  await page.waitForTimeout(wait);
}

// The keep bar's buttons at phone size: three in a row at the very foot,
// 8 dp in from the sides; after a log the note field is the row above.
const BAR = { setups: 70, log: 205, y: 885, noteY: 831 };

// openGas opens Working gas from the home list (its first entry).
async function openGas(page) {
  await tap(page, 200, 100, 1500);
}

// setupRows counts the setup rows in the open setups panel: white (or
// shaded, when selected) bands below Save as that reach the right margin,
// less the All saved work button at the end.
async function setupRows(page) {
  const b = bands(await column(page, 380), [SURFACE, SELECTED], 285, 40).filter((r) => r[1] < 850); // above the bar
  if (process.env.KEEP_DEBUG) console.log("setup row bands", JSON.stringify(b));
  return b.length - 1;
}

async function keepScenario({ browser, url, phone, check, shots }) {
  const shot = async (page, name) => {
    if (shots) await page.screenshot({ path: path.join(shots, name + ".png") });
  };
  if (shots) fs.mkdirSync(shots, { recursive: true });
  const ctx = await browser.newContext({ ...phone, acceptDownloads: true });
  const page = await ctx.newPage();
  await page.goto(url);
  await firstFrame(page);

  // Save a named setup.
  await openGas(page);
  await tap(page, BAR.setups, BAR.y);
  check(await setupRows(page) === 0, "the setups panel opens empty on a fresh profile");
  await tap(page, 200, 193, 400); // the name field
  await page.keyboard.type(NAME);
  await page.waitForTimeout(500); // the last letters reach the field before Enter
  await page.keyboard.press("Enter"); // Enter saves, as Save as does
  await page.waitForTimeout(1500);
  await shot(page, "keep-web-saved");
  check(await until(page, async () => (await stored(page, "library")).includes(`"name": "${NAME}"`)), `"${NAME}" is in the browser's IndexedDB`);
  check(await setupRows(page) === 1, `"${NAME}" is listed in the setups panel`);

  // Log a result with a note: one tap, then the note and Enter.
  await tap(page, BAR.setups, BAR.y); // close the panel
  await tap(page, BAR.log, BAR.y, 1200);
  await shot(page, "keep-web-logged");
  await tap(page, 100, BAR.noteY, 400);
  await page.keyboard.type(NOTE);
  await page.waitForTimeout(500);
  await page.keyboard.press("Enter");
  await page.waitForTimeout(1500);
  const lib = await until(page, async () => { const l = await stored(page, "library"); return l.includes(NOTE) && l; }) || "";
  check(lib.includes(`"note": "${NOTE}"`), `the logged result keeps its note "${NOTE}"`);
  check(/"rows": \[/.test(lib) && lib.includes('"calculator": "gas"'), "the logged result keeps its calculator and rows");

  // Reload, online then offline: both are still there.
  for (const offline of [false, true]) {
    if (offline) {
      await page.waitForFunction(async () => {
        const r = await navigator.serviceWorker.getRegistration();
        return !!(r && r.active && navigator.serviceWorker.controller);
      }, null, { timeout: 60000 });
      await ctx.setOffline(true);
    }
    await page.reload();
    await firstFrame(page);
    const how = offline ? "offline reload" : "reload";
    check((await stored(page, "library")).includes(NOTE), `after the ${how} the logged note is stored`);
    await openGas(page);
    await tap(page, BAR.setups, BAR.y, 1200);
    check(await setupRows(page) === 1, `after the ${how}, "${NAME}" is listed in the setups panel`);
    await shot(page, offline ? "keep-web-offline" : "keep-web-reloaded");
    if (offline) await ctx.setOffline(false);
  }

  // Export everything from the Saved work page (reached from the panel).
  // Buttons are found by their colour left of their words.
  const allBtn = bands(await column(page, 22), SELECTED, 240, 30).filter((r) => r[1] < 850).pop();
  check(!!allBtn, "the setups panel offers All saved work");
  await tap(page, 200, (allBtn[0] + allBtn[1]) / 2, 1200);
  const exportBtn = bands(await column(page, 20), ACCENT, 60, 30)[0];
  check(!!exportBtn, "the Saved work page shows Export everything");
  const exportY = (exportBtn[0] + exportBtn[1]) / 2;
  const [download] = await Promise.all([
    page.waitForEvent("download", { timeout: 15000 }),
    tap(page, 80, exportY, 200),
  ]);
  // Kept outside the context, whose downloads go when it closes.
  const file = path.join(fs.mkdtempSync(path.join(require("os").tmpdir(), "tw-keep-")), download.suggestedFilename());
  await download.saveAs(file);
  const exported = fs.readFileSync(file, "utf8");
  check(download.suggestedFilename().endsWith(".json") && exported.includes(NAME) && exported.includes(NOTE),
    `Export everything downloaded ${download.suggestedFilename()} with the setup and the log`);
  await shot(page, "keep-web-exported");
  await ctx.close();

  // A fresh profile (empty site storage): import the file back.
  const ctx2 = await browser.newContext(phone);
  const page2 = await ctx2.newPage();
  await page2.goto(url);
  await firstFrame(page2);
  await openGas(page2);
  await tap(page2, BAR.setups, BAR.y);
  check(await setupRows(page2) === 0 && !(await stored(page2, "library")).includes(NAME), "a fresh profile starts with no setups");
  const all2 = bands(await column(page2, 22), SELECTED, 240, 30).filter((r) => r[1] < 850).pop();
  await tap(page2, 200, (all2[0] + all2[1]) / 2, 1200);
  const exp2 = bands(await column(page2, 20), ACCENT, 60, 30)[0];
  const [chooser] = await Promise.all([
    page2.waitForEvent("filechooser", { timeout: 15000 }),
    tap(page2, 230, (exp2[0] + exp2[1]) / 2, 200), // Import a file, right of Export
  ]);
  await chooser.setFiles(file);
  await page2.waitForTimeout(2000);
  const lib2 = await until(page2, async () => { const l = await stored(page2, "library"); return l.includes(NAME) && l; }) || "";
  check(lib2.includes(NAME) && lib2.includes(NOTE), "the import put the setup and the logged result back");
  await shot(page2, "keep-web-imported");
  await ctx2.close();
}

module.exports = { keepScenario };
