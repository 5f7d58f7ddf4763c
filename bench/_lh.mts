import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";
const chrome = await chromeLauncher.launch({ chromePath: "/usr/bin/chromium", chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu"] });
for (const page of process.argv.slice(2)) {
  const r = await lighthouse(page, { port: chrome.port, output: "json", logLevel: "error" });
  const lhr = r!.lhr;
  for (const [cid, cat] of Object.entries(lhr.categories)) {
    if (cid === "performance") continue;
    for (const ref of cat.auditRefs) { const a = lhr.audits[ref.id]!; if (a.score !== null && a.score < 1 && ref.weight > 0) console.log(page, cid, a.id, a.score, a.title, JSON.stringify(a.details && (a.details as any).items ? (a.details as any).items.slice(0, 3) : "").slice(0, 400)); }
  }
  for (const id of ["largest-contentful-paint-element", "layout-shifts", "unused-javascript", "render-blocking-resources", "bootup-time"]) { const a = lhr.audits[id]; if (a) console.log(page, id, a.displayValue ?? "", JSON.stringify((a.details as any)?.items?.slice(0, 4) ?? "").slice(0, 600)); }
}
await chrome.kill();
