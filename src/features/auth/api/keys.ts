// Query keys for the signed-in account. Invalidate `authKeys.all` to refresh everything here.
export const authKeys = {
  all: ["auth"] as const,
  me: () => [...authKeys.all, "me"] as const,
};
