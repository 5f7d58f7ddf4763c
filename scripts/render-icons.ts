// Renders the app's icons (public/*.png) from its one drawing, public/favicon.svg, with Debian's Chromium:
// `npm run icons` after changing the drawing (tests/e2e/first-paint.test.ts fails while they differ). The pages and
// the manifest use only these PNGs: Chromium draws an SVG icon as a document of its own in the page's renderer while
// the page loads (DEVELOPERS.md, 2026-12-05).
//   - favicon-32, icon-192, icon-512: the drawing as it is, its rounded corners transparent;
//   - apple-touch-icon (180) and icon-maskable-512: full-bleed, the drawing at 80 % on its own background colour,
//     so the platform's mask (a circle, a squircle) never cuts into it (the maskable safe zone is the inner 80 %).
// Run on 2026-12-05, it wrote favicon-32, icon-192 and icon-512 byte for byte as committed, and the two full-bleed
// icons within one level per colour channel of the committed ones (kept: smaller files).
import fs from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { chromium, type Page } from "playwright-core";

export const ICONS: readonly { file: string; size: number; fullBleed: boolean }[] = [
  { file: "favicon-32.png", size: 32, fullBleed: false },
  { file: "icon-192.png", size: 192, fullBleed: false },
  { file: "icon-512.png", size: 512, fullBleed: false },
  { file: "apple-touch-icon.png", size: 180, fullBleed: true },
  { file: "icon-maskable-512.png", size: 512, fullBleed: true },
];

/** One icon as PNG bytes, drawn from the SVG text in the page given (at a device scale factor of 1). */
export async function renderIcon(page: Page, svg: string, size: number, fullBleed: boolean): Promise<Buffer> {
  const background = /<rect[^>]*fill="(#[0-9a-f]{6})"/i.exec(svg)?.[1];
  if (!background) throw new Error("favicon.svg: no background <rect fill> to extend for the full-bleed icons");
  await page.setViewportSize({ width: size, height: size });
  const art = fullBleed ? size * 0.8 : size;
  await page.setContent(
    `<style>html,body{margin:0;width:${size}px;height:${size}px;background:${fullBleed ? background : "transparent"}}` +
      `body{display:grid;place-items:center}svg{display:block;width:${art}px;height:${art}px}</style>${svg}`,
  );
  return await page.screenshot({ omitBackground: !fullBleed, type: "png" });
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const publicDir = path.resolve("public");
  const svg = fs.readFileSync(path.join(publicDir, "favicon.svg"), "utf8");
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: ["--no-sandbox"] });
  try {
    const page = await browser.newPage({ deviceScaleFactor: 1 });
    for (const { file, size, fullBleed } of ICONS) {
      fs.writeFileSync(path.join(publicDir, file), await renderIcon(page, svg, size, fullBleed));
      console.log(`public/${file} (${size}×${size}${fullBleed ? ", full-bleed" : ""})`);
    }
  } finally {
    await browser.close();
  }
}
