/**
 * The tagged codec for values crossing a boundary (files, IPC, worker messages): plain JSON,
 * except that a BigInt is written as {"$bigint": "<decimal>"} and read back as a BigInt, so
 * it never reaches JSON.stringify raw and never loses digits.
 */

const TAG = '$bigint';

export function encodeTagged(value: unknown, indent?: number): string {
  return JSON.stringify(value, (_key, v: unknown) => (typeof v === 'bigint' ? { [TAG]: v.toString() } : v), indent);
}

export function decodeTagged(text: string): unknown {
  return JSON.parse(text, (_key, v: unknown) => {
    if (v && typeof v === 'object' && !Array.isArray(v)) {
      const keys = Object.keys(v);
      const s = (v as Record<string, unknown>)[TAG];
      if (keys.length === 1 && typeof s === 'string' && /^-?\d+$/.test(s)) return BigInt(s);
    }
    return v;
  });
}
