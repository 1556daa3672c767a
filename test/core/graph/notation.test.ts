import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/core/errors.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { printNotation } from '../../../src/core/graph/notation-print.ts';
import { randomTheoryGraph, rng } from '../../helpers/random-graphs.ts';

describe('compact notation', () => {
  it('parses the one-loop four-point bubble', () => {
    const g = parseNotation('1-2 1-2 / 1 1 2 2');
    expect(g.vertices.map((v) => v.name)).toEqual(['1', '2']);
    expect(g.edges).toEqual([
      { a: 0, b: 1, field: null, oriented: false },
      { a: 0, b: 1, field: null, oriented: false },
    ]);
    expect(g.legs.map((l) => l.vertex)).toEqual([0, 0, 1, 1]);
  });

  it('parses fields, orientation and leg directions', () => {
    const g = parseNotation('a>b:psi b>a:psi a-b:A / >a:psi a>:psi b:A');
    expect(g.edges[0]).toEqual({ a: 0, b: 1, field: 'psi', oriented: true });
    expect(g.edges[2]).toEqual({ a: 0, b: 1, field: 'A', oriented: false });
    expect(g.legs).toEqual([
      { vertex: 0, field: 'psi', direction: 'in' },
      { vertex: 0, field: 'psi', direction: 'out' },
      { vertex: 1, field: 'A', direction: 'none' },
    ]);
  });

  it('parses counterterm vertices with residue and structure at any mention', () => {
    const g = parseNotation('1-c{phi,phi;p2} c-2 1-2 / 1 2');
    expect(g.vertices[1]).toEqual({ name: 'c', counterterm: { residue: ['phi', 'phi'], structure: 'p2' } });
    const h = parseNotation('1-c c-2 / 1 c{phi,phi,phi,phi}'.replace('/ 1 c{phi,phi,phi,phi}', '/ 1 c{phi,phi,phi,phi} 2'));
    expect(h.vertices[1]!.counterterm).toEqual({ residue: ['phi', 'phi', 'phi', 'phi'], structure: '' });
  });

  it('accepts self-loops, vacuum graphs and edge-less vertices', () => {
    expect(parseNotation('1-1 / 1 1').edges[0]).toMatchObject({ a: 0, b: 0 });
    expect(parseNotation('1-2 1-2 1-2 1-2 /').legs).toEqual([]);
    expect(parseNotation('/ 1 1 1 1').vertices).toHaveLength(1);
  });

  const roundTrips = [
    '1-2 1-2 / 1 1 2 2',
    '1-2 1-2 1-2 / 1 2',
    'a>b:psi b>a:psi a-b:A / >a:psi a>:psi b:A',
    '1-c{phi,phi;p2} c-2 1-2 1-2 / 1 2',
    'x_1-x_2 x_2-x_2 / x_1 x_1 x_1',
    '1-1 / 1 1',
    '/ 1 1 1 1',
  ];
  it.each(roundTrips)('round trip %s', (text) => {
    const g = parseNotation(text);
    expect(printNotation(g)).toBe(text);
    expect(parseNotation(printNotation(g))).toEqual(g);
  });

  it('round-trips random graphs of every theory (seeded)', () => {
    for (const theory of ['phi4', 'phi3', 'yukawa', 'qed']) {
      const r = rng(7);
      for (let i = 0; i < 50; i++) {
        const g = randomTheoryGraph(theory, r, { vertices: 2 + (i % 5) });
        const again = parseNotation(printNotation(g));
        // Vertices are numbered by first mention; compare through names.
        expect(printNotation(again)).toBe(printNotation(g));
        expect(again.edges.length).toBe(g.edges.length);
      }
    }
  });

  describe('errors name the position and what was expected', () => {
    const cases: [string, number, RegExp][] = [
      ['1-2 1-2 1 1 2 2', 9, /expected "-" or ">"/],
      ['1-2 1-', 6, /expected a vertex name/],
      ['1-2 1=2 / 1 1', 5, /expected "-" or ">"/],
      ['1-2 1-2', 7, /expected "\/"/],
      ['1-2:/ 1', 4, /expected a field name/],
      ['1-c{phi,phi / 1', 12, /expected "," or ";" or "}"/],
      ['1-c{phi;p2} c{phi,phi;p2}-2 / 1', 12, /two different residues/],
      ['1-2 / >1>', 8, /enters.*or leaves/],
    ];
    it.each(cases)('%s', (text, offset, message) => {
      let err: unknown;
      try {
        parseNotation(text);
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(InputError);
      const ie = err as InputError;
      expect(ie.message).toMatch(message);
      expect(ie.position?.offset).toBe(offset);
    });
  });

  it('never throws anything but InputError on arbitrary text (fuzz, seeded)', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom(...'12ab-> /:{},;psi_'.split('')), maxLength: 40 }), (s) => {
        try {
          parseNotation(s);
        } catch (e) {
          if (!(e instanceof InputError)) throw e;
        }
      }),
      { numRuns: 3000, seed: 42 },
    );
  });

  it('refuses absurdly long input before parsing', () => {
    expect(() => parseNotation('1-2 '.repeat(30_000) + '/')).toThrow(InputError);
  });
});
