export type Changes = Record<string, { from: unknown; to: unknown }>;

const comparable = (value: unknown) => (value instanceof Date ? value.toISOString() : value);

/**
 * Applies `patch` to `target` field by field and returns what actually changed, as the
 * audit trail records it (`{ field: { from, to } }`). Fields left undefined are untouched.
 */
export function applyChanges<T extends object>(target: T, patch: Partial<T>): Changes {
  const changes: Changes = {};
  for (const [field, next] of Object.entries(patch) as Array<[keyof T & string, unknown]>) {
    if (next === undefined) continue;
    const previous = target[field];
    if (JSON.stringify(comparable(previous)) === JSON.stringify(comparable(next))) continue;
    changes[field] = { from: comparable(previous), to: comparable(next) };
    target[field] = next as T[keyof T & string];
  }
  return changes;
}
