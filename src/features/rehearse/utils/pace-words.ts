// The pace scale's words: written once in shared/format.ts (issue 16).
export { paceFeel, rollPastWords } from "#shared/format";
