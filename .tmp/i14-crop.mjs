import { chromium } from "playwright-core";
import fs from "node:fs";
const [file, out, y, h, w = "390"] = process.argv.slice(2);
const b = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox"] });
const p = await b.newPage({ viewport: { width: Number(w), height: Number(h) } });
const data = fs.readFileSync(file).toString("base64");
await p.setContent(`<body style="margin:0"><img style="display:block;margin-top:-${y}px" src="data:image/png;base64,${data}"></body>`);
await p.screenshot({ path: out });
await b.close();
