/**
 * Elements Array#splice had to shift during `work`: the cost that made long Markdown paragraphs
 * quadratic (src/source/micromark-linear-text.ts). Shared by the parse and the size-limit tests.
 */
export function spliceWork(work: () => void): number {
  const original = Array.prototype.splice;
  let moved = 0;
  Array.prototype.splice = function counted(this: unknown[], ...args: unknown[]) {
    const start = Number(args[0] ?? 0);
    moved += Math.max(0, this.length - (start < 0 ? this.length + start : start));
    return original.apply(this, args as [number, number, ...unknown[]]);
  } as typeof Array.prototype.splice;
  try {
    work();
  } finally {
    Array.prototype.splice = original;
  }
  return moved;
}
