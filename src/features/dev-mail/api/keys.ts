export const devMailKeys = {
  all: ["dev-mail"] as const,
  list: () => [...devMailKeys.all, "list"] as const,
  probe: () => [...devMailKeys.all, "probe"] as const,
};
