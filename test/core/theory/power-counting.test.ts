import { describe, expect, it } from 'vitest';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { parseTheory } from '../../../src/core/theory/parse-theory.ts';
import { couplingDimensions, omegaOfGraph, residueOfGraph } from '../../../src/core/theory/power-counting.ts';
import { inspectGraph } from '../../../src/core/inspect/graph-report.ts';

const bound = (theory: string, text: string) => bindGraph(parseNotation(text), builtinTheory(theory));

// Superficial degrees of divergence of textbook graphs — common practice (ω = D0·L − Σ weights;
// e.g. "An Introduction to Quantum Field Theory", 1995, §10.1 for φ⁴ and QED).
describe('power counting on textbook cases', () => {
  const cases: [string, string, string, number, string[]][] = [
    ['phi4', 'four-point bubble', '1-2 1-2 / 1 1 2 2', 0, ['phi', 'phi', 'phi', 'phi']],
    ['phi4', 'two-point sunset', '1-2 1-2 1-2 / 1 2', 2, ['phi', 'phi']],
    ['phi4', 'tadpole', '1-1 / 1 1', 2, ['phi', 'phi']],
    ['phi4-on', 'four-point bubble', '1-2 1-2 / 1 1 2 2', 0, ['phi', 'phi', 'phi', 'phi']],
    ['phi3', 'three-point triangle (D0 = 6)', '1-2 2-3 3-1 / 1 2 3', 0, ['phi', 'phi', 'phi']],
    ['phi3', 'two-point bubble (D0 = 6)', '1-2 1-2 / 1 2', 2, ['phi', 'phi']],
    ['qed', 'photon self-energy', '1>2 2>1 / 1 2', 2, ['A', 'A']],
    ['qed', 'electron self-energy', '1>2 1-2 / >1 2>', 1, ['psi', 'psibar']],
    ['qed', 'vertex correction', '1>2 2>3 1-3 / >1 2 3>', 0, ['A', 'psi', 'psibar']],
    ['qed', 'four-photon box', '1>2 2>3 3>4 4>1 / 1 2 3 4', 0, ['A', 'A', 'A', 'A']],
    ['yukawa', 'fermion self-energy', '1>2:psi 1-2 / >1:psi 2>:psi', 1, ['psi', 'psibar']],
    ['yukawa', 'scalar self-energy from a fermion loop', '1>2:psi 2>1:psi / 1 2', 2, ['phi', 'phi']],
    ['yukawa', 'quartic scalar box from a fermion loop', '1>2:psi 2>3:psi 3>4:psi 4>1:psi / 1 2 3 4', 0, ['phi', 'phi', 'phi', 'phi']],
  ];
  it.each(cases)('%s: %s has ω = %#', (theory, _name, text, omega, residue) => {
    const bg = bound(theory, text);
    expect(omegaOfGraph(bg)).toBe(omega);
    expect(residueOfGraph(bg)).toEqual(residue);
  });

  it('QED four-photon graph is reported as cancelling by gauge invariance, not as non-renormalizable', () => {
    const r = inspectGraph(bound('qed', '1>2 2>3 3>4 4>1 / 1 2 3 4'));
    expect(r.omega).toBe(0);
    expect(r.warnings.some((w) => /no counterterm in the theory for residue \(A,A,A,A\).*gauge invariance/.test(w))).toBe(true);
    expect(r.warnings.some((w) => /non-renormalizable/.test(w))).toBe(false);
  });

  it("QED three-photon triangle cites Furry's theorem", () => {
    const r = inspectGraph(bound('qed', '1>2 2>3 3>1 / 1 2 3'));
    expect(r.omega).toBe(1);
    expect(r.warnings.join('\n')).toMatch(/Furry/);
  });

  it('Yukawa φ³ residue: a missing Lagrangian term or a symmetry, stated as such', () => {
    const r = inspectGraph(bound('yukawa', '1>2:psi 2>3:psi 3>1:psi / 1 2 3'));
    expect(r.omega).toBe(1);
    expect(r.warnings.join('\n')).toMatch(/no counterterm in the theory for residue \(phi,phi,phi\).*Lagrangian lacks this term.*symmetry/);
  });

  it('all built-in couplings are dimensionless (renormalizable by power counting)', () => {
    for (const name of ['phi4', 'phi4-on', 'phi3', 'yukawa', 'qed']) {
      for (const d of couplingDimensions(builtinTheory(name)).values()) expect(d).toBe(0);
    }
  });

  it('φ⁶ in four dimensions is non-renormalizable: coupling of mass dimension −2, ω grows with L', () => {
    const phi6 = parseTheory({
      name: 'phi6-d4',
      dimension: 4,
      fields: [{ name: 'phi', statistics: 'boson', propagatorWeight: 2, line: 'plain' }],
      vertices: [{ fields: ['phi', 'phi', 'phi', 'phi', 'phi', 'phi'], coupling: 'g', normalization: '1/720' }],
      couplings: [{ name: 'g' }],
    });
    expect(couplingDimensions(phi6).get('g')).toBe(-2);
    const one = bindGraph(parseNotation('1-2 1-2 / 1 1 1 1 2 2 2 2'), phi6);
    const two = bindGraph(parseNotation('1-2 1-2 2-3 2-3 / 1 1 1 1 2 2 3 3 3 3'), phi6);
    expect(omegaOfGraph(one)).toBe(0);
    expect(omegaOfGraph(two)).toBe(0);
    const three = bindGraph(parseNotation('1-2 1-2 1-2 / 1 1 1 2 2 2'), phi6);
    expect(omegaOfGraph(three)).toBe(2); // six-point two-loop: ω = 8 − 6
    expect(inspectGraph(three).warnings.join('\n')).toMatch(/non-renormalizable.*coupling g has mass dimension -2/);
  });

  it('a counterterm vertex carries its structure: p² adds two powers of momentum', () => {
    const plain = bound('phi4', '1-2 1-2 / 1 1 2 2');
    const inserted = bound('phi4', '1-c{phi,phi;p2} c-2 1-2 / 1 1 2 2');
    // Splitting a line (weight 2) into two with a p² insertion: −2 + 2 = 0 change.
    expect(omegaOfGraph(inserted)).toBe(omegaOfGraph(plain));
  });
});
