import { describe, expect, it } from 'vitest';
import { LimitError } from '../../../src/core/errors.ts';
import { printNotation } from '../../../src/core/graph/notation-print.ts';
import { checkSampleRequest } from '../../../src/core/periods/period-estimate.ts';
import { PeriodGraphError, periodInput } from '../../../src/core/periods/period-input.ts';
import { buildSectorTables } from '../../../src/core/periods/sector-tables.ts';
import { removeVertex } from '../../../src/core/periods/remove-vertex.ts';
import { periodGraphFromEdges } from '../../../src/core/periods/period-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { circulant12, graph, WHEEL3 } from './graphs.ts';

const phi4 = builtinTheory('phi4');
const reason = (f: () => unknown) => {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(PeriodGraphError);
    return (e as PeriodGraphError).reason;
  }
  throw new Error('expected a refusal');
};

describe('which graphs have a period', () => {
  it('accepts the wheel with three spokes and the one-loop bubble', () => {
    expect(periodInput(graph(WHEEL3), phi4).periodGraph).toMatchObject({ loops: 3, edgeCount: 6, halfDimension: 2 });
    expect(periodInput(graph('1-2 1-2 / 1 1 2 2'), phi4).removedVertex).toBeNull();
  });

  it('refuses a graph with a subdivergence (chain of two bubbles)', () => {
    expect(reason(() => periodInput(graph('1-2 1-2 2-3 2-3 / 1 1 3 3'), phi4))).toBe('not-primitive');
  });

  it('refuses graphs that are not logarithmically divergent (sunset, ω = 2)', () => {
    expect(reason(() => periodInput(graph('1-2 1-2 1-2 / 1 2'), phi4))).toBe('not-log-divergent');
  });

  it('refuses a one-particle reducible graph', () => {
    expect(reason(() => periodInput(graph('1-2 1-2 2-3 3-4 3-4 / 1 1 4 4 2 3'), phi4))).toBe('not-1pi');
  });

  it('refuses a vacuum graph that is not 4-regular (as a completion) and names the vertex', () => {
    expect(() => periodInput(graph('1-2 1-2 /'), phi4)).toThrow();
  });

  it('the tables refuse a subdivergence or a non-logarithmic graph on their own (defence in depth)', () => {
    expect(() => buildSectorTables(periodGraphFromEdges(3, [[0, 1], [0, 1], [1, 2], [1, 2]]))).toThrow(/divergent subgraph/);
    expect(() => buildSectorTables(periodGraphFromEdges(2, [[0, 1], [0, 1], [0, 1]]))).toThrow(/not logarithmically divergent/);
  });

  it('accepts the φ³ triangle in six dimensions (h = 3)', () => {
    expect(periodInput(graph('1-2 2-3 3-1 / 1 2 3'), builtinTheory('phi3')).periodGraph.halfDimension).toBe(3);
  });
});

describe('completed graphs', () => {
  it('removing a vertex of K5 gives K4 with one leg at each remaining vertex', () => {
    const k5 = graph('a-b a-c a-d a-e b-c b-d b-e c-d c-e d-e /');
    expect(printNotation(removeVertex(k5, 0), {})).toBe('b-c b-d b-e c-d c-e d-e / b c d e');
    const input = periodInput(k5, phi4, { removeVertex: 'c' });
    expect(input.removedVertex).toBe('c');
    expect(input.periodGraph.loops).toBe(3);
  });

  it('defaults to the first vertex, and the octahedron gives wheel 4', () => {
    const input = periodInput(graph(circulant12(6)), phi4);
    expect(input.removedVertex).toBe('v0');
    expect(input.periodGraph).toMatchObject({ loops: 4, edgeCount: 8 });
  });

  it('refuses --remove-vertex on a graph with legs, and unknown vertex names', () => {
    expect(() => periodInput(graph(WHEEL3), phi4, { removeVertex: '1' })).toThrow(/completed/);
    expect(() => periodInput(graph(circulant12(5)), phi4, { removeVertex: 'zz' })).toThrow(/no vertex "zz"/);
  });
});

describe('limits', () => {
  it('absurd sample counts are a LimitError naming maxSamples', () => {
    try {
      checkSampleRequest(2e10, 1);
      throw new Error('expected a LimitError');
    } catch (e) {
      expect(e).toBeInstanceOf(LimitError);
      expect((e as LimitError).limit).toBe('maxSamples');
    }
    expect(() => checkSampleRequest(2e10, 1, { maxSamples: 3e10 })).not.toThrow();
  });

  it('graphs beyond maxEdges are a LimitError naming maxEdges', () => {
    const big = periodGraphFromEdges(13, Array.from({ length: 24 }, (_, i) => [i % 13, (i * 5 + 1) % 13] as [number, number]));
    try {
      buildSectorTables(big);
      throw new Error('expected a LimitError');
    } catch (e) {
      expect(e).toBeInstanceOf(LimitError);
      expect((e as LimitError).limit).toBe('maxEdges');
    }
  });
});
