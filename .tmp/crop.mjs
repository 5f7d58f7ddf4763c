import { chromium } from "playwright-core";
const [file, w, h, step, prefix] = process.argv.slice(2);
const b = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox"] });
const p = await b.newPage({ viewport: { width: Number(w), height: Number(step) } });
await p.setContent(`<body style="margin:0"><img src="data:image/png;base64,${(await import("node:fs")).readFileSync(file).toString("base64")}" style="display:block"></body>`);
for (let y = 0, i = 0; y < Number(h); y += Number(step), i++) {
  await p.screenshot({ path: `${prefix}-${i}.png`, clip: { x: 0, y, width: Number(w), height: Math.min(Number(step), Number(h) - y) }, fullPage: true });
}
await b.close();
