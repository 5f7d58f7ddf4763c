/**
 * Splits a list into the viewer's own items and everyone else's (an admin sees every coach's squads and
 * ladders): the pages label the second group with each owner instead of calling everything "yours".
 */
export function splitByOwner<T>(items: readonly T[], viewerId: string, ownerOf: (item: T) => string | null): { own: T[]; others: T[] } {
  const own: T[] = [];
  const others: T[] = [];
  for (const item of items) (ownerOf(item) === viewerId ? own : others).push(item);
  return { own, others };
}
