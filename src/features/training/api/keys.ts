// Query keys for read training. Invalidate `trainingKeys.all` after an attempt is kept.
export const trainingKeys = {
  all: ["training"] as const,
  attempts: (limit: number) => [...trainingKeys.all, "attempts", limit] as const,
};
