// One flat config: TypeScript rules, React hooks rules, and the import direction of the four roots
// (physics ← shared ← server | src; server and src never import each other; features stay apart).
import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";
import { importX } from "eslint-plugin-import-x";
import globals from "globals";
import fs from "node:fs";
import { createTypeScriptImportResolver } from "eslint-import-resolver-typescript";

function featureNames() {
  try {
    return fs
      .readdirSync(new URL("./src/features", import.meta.url), { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name);
  } catch {
    return [];
  }
}

const NO_ENUM = { selector: "TSEnumDeclaration", message: "Use a const object or a union instead of enum." };

export default tseslint.config(
  { ignores: ["dist/", "dist-server/", "dist-bench/", "dist-test/", "node_modules/", "data/", "coverage/", "drizzle/"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    plugins: { "import-x": importX },
    settings: { "import-x/resolver-next": [createTypeScriptImportResolver({ project: "./tsconfig.json" })] },
    rules: {
      "@typescript-eslint/no-explicit-any": "off",
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" },
      ],
      "import-x/no-cycle": ["error", { maxDepth: 10 }],
      "import-x/no-restricted-paths": [
        "error",
        {
          zones: [
            {
              target: "./physics/**/!(*.test).ts",
              from: ["./shared", "./server", "./src", "./tests"],
              message: "physics/ is pure: it imports nothing of the app.",
            },
            { target: "./shared", from: ["./server", "./src", "./tests"], message: "shared/ imports only zod and physics/." },
            { target: "./server", from: "./src", message: "server/ never imports the client." },
            { target: "./src", from: "./server", message: "src/ never imports the server." },
            // One zone per feature: it may import itself and auth (the current-user hook), no other feature.
            // (A single glob zone also forbade a feature's imports of its own files.)
            {
              target: ["./src/components", "./src/lib"],
              from: "./src/features",
              message: "src/components and src/lib are shared by the features: they import no feature.",
            },
            ...featureNames()
              .filter((name) => name !== "auth")
              .map((name) => ({
                target: `./src/features/${name}`,
                from: "./src/features",
                except: [`./${name}`, "./auth"],
                message:
                  "A feature does not import another feature (auth's current-user hook excepted); lift shared code to src/components or src/lib.",
              })),
          ],
        },
      ],
      "no-restricted-syntax": ["error", NO_ENUM],
    },
  },
  {
    // The environment is read in one place (server/env.ts, checked with zod); everything else gets it from there.
    files: ["server/**/*.ts", "shared/**/*.ts", "physics/**/*.ts", "src/**/*.{ts,tsx}"],
    ignores: ["server/env.ts", "**/*.test.{ts,tsx}"],
    rules: {
      "no-restricted-syntax": [
        "error",
        NO_ENUM,
        {
          selector: "MemberExpression[object.name='process'][property.name='env']",
          message: "Read the environment through server/env.ts.",
        },
      ],
    },
  },
  {
    // react-three-fiber's two performance rules (as @react-three/eslint-plugin's no-new-in-loop and
    // no-clone-in-loop; that plugin declares eslint 8 as its peer): nothing allocated inside a frame callback.
    files: ["src/components/green-3d/**/*.tsx", "src/features/**/components/**/*.tsx"],
    ignores: ["**/*.test.tsx"],
    rules: {
      "no-restricted-syntax": [
        "error",
        NO_ENUM,
        {
          selector: "MemberExpression[object.name='process'][property.name='env']",
          message: "Read the environment through server/env.ts.",
        },
        {
          selector: "CallExpression[callee.name='useFrame'] NewExpression",
          message: "No `new` inside useFrame (60 times a second): allocate once outside and reuse it.",
        },
        {
          selector: "CallExpression[callee.name='useFrame'] CallExpression[callee.property.name='clone']",
          message: "No .clone() inside useFrame: copy into an object made once outside.",
        },
      ],
    },
  },
  {
    // Toasts go through src/lib/toast.ts, which loads sonner after the first page; a direct import would put it back
    // into every first page's scripts.
    files: ["src/**/*.{ts,tsx}"],
    ignores: ["src/lib/toast.ts", "src/components/ui/toaster.tsx"],
    rules: {
      "no-restricted-imports": [
        "error",
        { paths: [{ name: "sonner", message: "Use toast from src/lib/toast.ts and Toaster from src/components/ui/toaster.tsx." }] },
      ],
    },
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
);
