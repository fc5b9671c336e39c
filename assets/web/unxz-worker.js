// The worker half of unxz.js: assets/web/pack appends this file to the
// xz-decompress package's script. Loaded by the page (window) it does
// nothing; started as a worker it unpacks one xz stream: it takes the
// stream's bytes as messages (null at the end) and sends back the unpacked
// bytes, then null, or {error} when the stream is damaged.
;(function () {
  "use strict";
  if (typeof WorkerGlobalScope === "undefined" || !(self instanceof WorkerGlobalScope)) return;
  let input;
  const source = new ReadableStream({ start(c) { input = c; } });
  self.onmessage = (e) => { if (e.data) input.enqueue(e.data); else input.close(); };
  (async () => {
    try {
      const out = new self["xz-decompress"].XzReadableStream(source).getReader();
      for (;;) {
        const r = await out.read();
        if (r.done) break;
        self.postMessage(r.value, [r.value.buffer]);
      }
      self.postMessage(null);
    } catch (err) {
      self.postMessage({ error: String(err) });
    }
  })();
})();
