// Tubewright's service worker: keeps the app's own files in a cache so the
// app starts with no network. Cache first, then the network (same origin
// only) to fill the cache. Bump VERSION when the file list changes; a new
// build is picked up because the network copy refreshes the cache in the
// background.
"use strict";
const VERSION = "tubewright-v1";
const FILES = [
  "./",
  "index.html",
  "wasm_exec.js",
  "tubewright.wasm",
  "manifest.webmanifest",
  "icon.svg",
  "icon-192.png",
  "icon-512.png",
];

self.addEventListener("install", (event) => {
  event.waitUntil(caches.open(VERSION).then((c) => c.addAll(FILES)).then(() => self.skipWaiting()));
});

self.addEventListener("activate", (event) => {
  event.waitUntil(
    caches.keys()
      .then((keys) => Promise.all(keys.filter((k) => k !== VERSION).map((k) => caches.delete(k))))
      .then(() => self.clients.claim()));
});

self.addEventListener("fetch", (event) => {
  const req = event.request;
  if (req.method !== "GET" || new URL(req.url).origin !== self.location.origin) {
    return; // the app never asks other sites for anything
  }
  event.respondWith(
    caches.open(VERSION).then(async (cache) => {
      const hit = await cache.match(req, { ignoreSearch: true });
      const refresh = fetch(req)
        .then((resp) => {
          if (resp.ok) cache.put(req, resp.clone());
          return resp;
        })
        .catch(() => undefined);
      if (hit) {
        event.waitUntil(refresh);
        return hit;
      }
      const resp = await refresh;
      return resp || new Response("offline and not cached: " + req.url, { status: 503 });
    }));
});
