// Tubewright's service worker: the app's own files, kept as one set per
// build so the app starts with no network.
//
// assets/web/pack fills in BUILD (a hash of the build's files) and FILES
// (exactly the files of the built folder but this one; a Go test checks
// the list against the folder). A new build is fetched whole into a new
// cache; only when every file has arrived does the new set take over and
// the old one go. Nothing is fetched from any other site.
"use strict";
const BUILD = "__BUILD__";
const CACHE = "tubewright-" + BUILD;
const FILES = [];
const WASM_XZ = "tubewright.wasm.xz";
const WASM_GZ = "tubewright.wasm.gz";
const WASM_RAW = "tubewright.wasm";
const WASM = [WASM_XZ, WASM_GZ, WASM_RAW];
// The app is needed in one form, the one the page fetches first: xz where
// the build has it (with its decoder, unxz.js), else gzip where the
// browser can unpack it, else raw. The other forms are not downloaded.
const FORM = FILES.includes(WASM_XZ) ? WASM_XZ
  : typeof DecompressionStream === "function" ? WASM_GZ : WASM_RAW;
// The install icons (PNG) are left out too: only a browser installing the
// app asks for them, and it keeps its own copy; the app starts without them.
const INSTALL_ICONS = ["icon-192.png", "icon-512.png"];
const SET = FILES.filter((f) => (!WASM.includes(f) || f === FORM) && !INSTALL_ICONS.includes(f));

self.addEventListener("install", (event) => {
  event.waitUntil((async () => {
    const cache = await caches.open(CACHE);
    try {
      const got = await Promise.all(SET.map(async (f) => {
        // The page fetched the app (and unxz.js) as f?v=BUILD a moment
        // ago: take that copy from the browser's HTTP cache rather than
        // download it again.
        // The page itself is asked for as "./", the address it was loaded
        // from, so the browser revalidates its copy rather than download it.
        const seen = f === FORM || f === "unxz.js";
        const url = seen ? f + "?v=" + BUILD : f === "index.html" ? "./" : f;
        const req = new Request(url, { cache: seen ? "force-cache" : "no-cache" });
        const resp = await fetch(req);
        if (!resp.ok) throw new Error(f + ": HTTP " + resp.status);
        // A fresh response: a redirected one cannot answer a navigation.
        return [f, new Response(await resp.blob(), { headers: resp.headers })];
      }));
      for (const [f, resp] of got) {
        if (f === "index.html") await cache.put("./", resp.clone());
        await cache.put(f, resp);
      }
    } catch (err) {
      await caches.delete(CACHE); // an incomplete set is never used
      throw err;
    }
    await self.skipWaiting();
  })());
});

self.addEventListener("activate", (event) => {
  event.waitUntil((async () => {
    for (const k of await caches.keys()) {
      if (k.startsWith("tubewright-") && k !== CACHE) await caches.delete(k);
    }
    await self.clients.claim();
  })());
});

self.addEventListener("fetch", (event) => {
  const req = event.request;
  if (req.method !== "GET" || new URL(req.url).origin !== self.location.origin) {
    return; // the app never asks other sites for anything
  }
  event.respondWith((async () => {
    const cache = await caches.open(CACHE);
    const hit = await cache.match(req, { ignoreSearch: true });
    if (hit) return hit;
    try {
      return await fetch(req);
    } catch (err) {
      return new Response("Tubewright is offline and this file is not in its set: " + req.url,
        { status: 503, headers: { "Content-Type": "text/plain; charset=utf-8" } });
    }
  })());
});
