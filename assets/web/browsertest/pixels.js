"use strict";
// Helpers the browser scenarios share.

// column returns the colours of the page's pixels at x, top to bottom.
async function column(page, x) {
  const png = (await page.screenshot()).toString("base64");
  return page.evaluate(async ({ png, x }) => {
    const img = new Image();
    img.src = "data:image/png;base64," + png;
    await img.decode();
    const c = document.createElement("canvas");
    c.width = img.width; c.height = img.height;
    const g = c.getContext("2d");
    g.drawImage(img, 0, 0);
    const d = g.getImageData(x, 0, 1, img.height).data;
    const out = [];
    for (let i = 0; i < d.length; i += 4) out.push([d[i], d[i + 1], d[i + 2]]);
    return out;
  }, { png, x });
}

module.exports = { column };
