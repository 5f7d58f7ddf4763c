// After `vite build` (the e2e global setup runs it): the first page's JS must not carry three.js, and the 3D scene
// must still be reachable, through a dynamic import only.
import fs from "node:fs";
import path from "node:path";
import { expect, test } from "vitest";

type Chunk = {
  file: string;
  name?: string;
  src?: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
};

const DIST = path.resolve("dist");
const manifest = JSON.parse(fs.readFileSync(path.join(DIST, ".vite/manifest.json"), "utf8")) as Record<string, Chunk>;
const read = (key: string) => fs.readFileSync(path.join(DIST, manifest[key]!.file), "utf8");
// Strings only three.js's renderer code contains (class names survive minification as strings and properties).
const THREE_MARKERS = ["WebGLRenderer", "WebGLShadowMap", "THREE.WebGLRenderer"];
const hasThree = (key: string) =>
  THREE_MARKERS.some((m) => read(key).includes(m)) || /three/i.test(manifest[key]!.name ?? "") || /three/i.test(manifest[key]!.file);

/** The chunk and every chunk it imports statically (what the browser loads before the module runs). */
function staticClosure(key: string): Set<string> {
  const seen = new Set<string>();
  const stack = [key];
  while (stack.length) {
    const k = stack.pop()!;
    if (seen.has(k)) continue;
    seen.add(k);
    for (const i of manifest[k]?.imports ?? []) stack.push(i);
  }
  return seen;
}

test("the entry chunk (index.html) and its static imports hold no three.js code", () => {
  expect(manifest["index.html"]?.isEntry).toBe(true);
  const first = [...staticClosure("index.html")];
  expect(first.length).toBeGreaterThan(0);
  expect(first.filter(hasThree)).toEqual([]);
});

test("the rehearse and training routes load three.js only through a dynamic import of the 3D scene", () => {
  for (const route of ["src/app/routes/rehearse.tsx", "src/app/routes/train.tsx"]) {
    const closure = staticClosure(route);
    expect([...closure].filter(hasThree)).toEqual([]);
    const dynamic = [...closure].flatMap((k) => manifest[k]?.dynamicImports ?? []);
    expect(dynamic).toContain("src/components/green-3d/green-scene.tsx");
  }
  // The check can fail: the scene's own static imports do hold three.js.
  expect([...staticClosure("src/components/green-3d/green-scene.tsx")].some(hasThree)).toBe(true);
});

test("the green map route loads three.js only through a dynamic import of the surface scene", () => {
  const closure = staticClosure("src/app/routes/green-map.tsx");
  expect([...closure].filter(hasThree)).toEqual([]);
  expect([...closure].flatMap((k) => manifest[k]?.dynamicImports ?? [])).toContain("src/components/green-3d/surface-scene.tsx");
  expect([...staticClosure("src/components/green-3d/surface-scene.tsx")].some(hasThree)).toBe(true);
});

test("recharts stays out of the first page too", () => {
  const first = [...staticClosure("index.html")];
  expect(first.filter((k) => /recharts|charts/i.test(manifest[k]!.name ?? "") || read(k).includes("recharts-wrapper"))).toEqual([]);
});
