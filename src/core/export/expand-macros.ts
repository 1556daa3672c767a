/**
 * Writes our macros out in full (for a KaTeX preview that should not depend on macro
 * definitions, or meet KaTeX's expansion limit on large formulas): every `\Name` of the macro
 * table, with its brace-delimited arguments, is replaced by its definition until none is left.
 */
import { katexMacros, latexMacros, type LatexScheme } from './latex-macros.ts';

/** The argument in braces starting at `i` (or a single token), and the index after it. */
function readArgument(s: string, i: number): [string, number] {
  let k = i;
  while (s[k] === ' ') k++;
  if (s[k] !== '{') {
    if (s[k] === '\\') {
      const m = /^\\([A-Za-z]+|.)/.exec(s.slice(k))!;
      return [m[0], k + m[0].length];
    }
    return [s[k] ?? '', k + 1];
  }
  let depth = 0;
  for (let j = k; j < s.length; j++) {
    if (s[j] === '\\') {
      j++;
      continue;
    }
    if (s[j] === '{') depth++;
    else if (s[j] === '}' && --depth === 0) return [s.slice(k + 1, j), j + 1];
  }
  throw new Error(`unbalanced braces after position ${i}`);
}

export function expandMacros(tex: string, scheme: LatexScheme, overrides: Readonly<Record<string, string>> = {}): string {
  const bodies: Record<string, string> = { ...katexMacros(scheme), ...overrides };
  const arity = new Map(latexMacros().map((m) => [m.name, m.args]));
  const names = Object.keys(bodies).sort((a, b) => b.length - a.length).map((n) => n.slice(1));
  const re = new RegExp(`\\\\(${names.join('|')})(?![A-Za-z])`);
  let s = tex;
  for (let round = 0; round < 10_000; round++) {
    const m = re.exec(s);
    if (!m) return s;
    const name = `\\${m[1]}`;
    let end = m.index + m[0].length;
    const args: string[] = [];
    for (let a = 0; a < (arity.get(name) ?? 0); a++) {
      const [arg, next] = readArgument(s, end);
      args.push(arg);
      end = next;
    }
    let body = bodies[name]!.replace(/#(\d)/g, (_, d: string) => args[Number(d) - 1] ?? '');
    // Keep a letter after a control word from fusing with it (\Gamma x, not \Gammax).
    if (/\\[A-Za-z]+$/.test(body) && /^[A-Za-z]/.test(s.slice(end))) body += ' ';
    s = s.slice(0, m.index) + body + s.slice(end);
  }
  throw new Error('macro expansion did not terminate');
}
