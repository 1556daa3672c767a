import { isOnePIGraph, loopNumber } from '../graph/connectivity.ts';
import { edgeIndices, fullEdgeSet } from '../graph/edge-set.ts';
import { subgraphAsGraph } from '../graph/extract-subgraph.ts';
import type { Graph } from '../graph/types.ts';
import { bindGraph, type BoundGraph } from '../theory/bind-graph.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';
import type { Theory } from '../theory/types.ts';
import { divergentSubgraphs, type DivergentSubgraph } from '../subgraphs/divergent-subgraphs.ts';
import { admissibleSubgraphs, type AdmissibleSubgraph } from './admissible.ts';
import { cographs } from './cograph.ts';
import { Combination, multiply, multiplyTensors, single, tensorKey, type Monomial } from './element.ts';
import type { GraphClassifier } from './graph-classifier.ts';

/** One collected term γ ⊗ Γ/γ of a coproduct, with a representative admissible subgraph. */
export interface CoproductTerm {
  /** Edge indices (input order) of each component of the representative γ. */
  readonly components: readonly (readonly number[])[];
  /** The classes of γ's components (sorted canonical keys). */
  readonly left: Monomial;
  /** The class of the cograph Γ/γ. */
  readonly right: string;
  /** Number of admissible subgraphs of Γ in this class of pairs. */
  readonly multiplicity: number;
}

/** What the algebra knows about one graph. */
export interface GraphAnalysis {
  readonly bound: BoundGraph;
  /** Divergent (1PI, ω ≥ 0, at least one loop): Δ has the Γ⊗1 term; otherwise Δ is a coaction. */
  readonly divergent: boolean;
  /** Proper connected divergent subgraphs. */
  readonly subgraphs: readonly DivergentSubgraph[];
  readonly admissible: readonly AdmissibleSubgraph[];
  readonly terms: readonly CoproductTerm[];
}

/**
 * The Connes–Kreimer Hopf algebra of a theory's 1PI graphs (DESIGN §3), over classes decided by
 * a classifier. Graph analyses, coproducts and antipodes are memoized per class.
 */
export class HopfAlgebra {
  private readonly reps = new Map<string, BoundGraph>();
  private readonly analyses = new Map<string, GraphAnalysis>();
  private readonly antipodes = new Map<string, Combination>();

  constructor(
    readonly theory: Theory,
    private readonly classifier: GraphClassifier,
  ) {}

  /** The class of a graph (binding it to the theory first), remembering it as representative. */
  classOf(g: Graph | BoundGraph): string {
    const bg = 'theory' in g ? g : bindGraph(g, this.theory);
    const key = this.classifier.canonical(bg.graph);
    if (!this.reps.has(key)) this.reps.set(key, bg);
    return key;
  }

  representative(key: string): BoundGraph {
    const bg = this.reps.get(key);
    if (!bg) throw new Error(`unknown graph class ${key}`);
    return bg;
  }

  /** Subgraphs, admissible subgraphs and collected coproduct terms of a graph. */
  analyze(g: Graph | BoundGraph): GraphAnalysis {
    const bg = 'theory' in g ? g : bindGraph(g, this.theory);
    const key = this.classOf(bg);
    const known = this.analyses.get(key);
    if (known && known.bound === bg) return known;
    const full = fullEdgeSet(bg.graph.edges.length);
    const all = divergentSubgraphs(bg);
    const subgraphs = all.filter((s) => s.edges !== full);
    const divergent = isOnePIGraph(bg.graph) && loopNumber(bg.graph) > 0 && omegaOfGraph(bg) >= 0;
    const admissible = admissibleSubgraphs(subgraphs);
    const collected = new Map<string, { components: number[][]; left: Monomial; right: string; multiplicity: number }>();
    for (const a of admissible) {
      const comps = a.components.map((i) => subgraphs[i]!);
      const left = comps.map((c) => this.classOf(bindGraph(subgraphAsGraph(bg.graph, c.edgeList).graph, this.theory))).sort();
      for (const q of cographs(bg, comps)) {
        const right = this.classOf(bindGraph(q, this.theory));
        const k = tensorKey([left, [right]]);
        const t = collected.get(k);
        if (t) t.multiplicity++;
        else collected.set(k, { components: comps.map((c) => [...c.edgeList]), left, right, multiplicity: 1 });
      }
    }
    const analysis: GraphAnalysis = { bound: bg, divergent, subgraphs, admissible, terms: [...collected.values()] };
    if (!known) this.analyses.set(key, analysis);
    return analysis;
  }

  private analysisOf(key: string): GraphAnalysis {
    return this.analyses.get(key) ?? this.analyze(this.representative(key));
  }

  /** Δ(Γ) in H⊗H: Γ⊗1 (divergent graphs only) + 1⊗Γ + Σ γ⊗Γ/γ. */
  coproduct(key: string): Combination {
    const a = this.analysisOf(key);
    const out = new Combination();
    if (a.divergent) out.add(tensorKey([[key], []]), 1n);
    out.add(tensorKey([[], [key]]), 1n);
    for (const t of a.terms) out.add(tensorKey([t.left, [t.right]]), BigInt(t.multiplicity));
    return out;
  }

  /** The reduced coproduct Δ'(Γ) = Δ(Γ) − Γ⊗1 − 1⊗Γ. */
  reducedCoproduct(key: string): Combination {
    const out = new Combination();
    for (const t of this.analysisOf(key).terms) out.add(tensorKey([t.left, [t.right]]), BigInt(t.multiplicity));
    return out;
  }

  /** Δ extended multiplicatively to a monomial (Δ(1) = 1⊗1). */
  coproductOfMonomial(m: Monomial): Combination {
    let acc = Combination.of([[tensorKey([[], []]), 1n]]);
    for (const k of m) acc = multiplyTensors(acc, this.coproduct(k));
    return acc;
  }

  /**
   * The antipode, recursively: S(Γ) = −Γ − Σ S(γ) Γ/γ over proper admissible γ, S multiplicative
   * (S of a product of components is the product of their antipodes).
   */
  antipode(key: string): Combination {
    const hit = this.antipodes.get(key);
    if (hit) return hit;
    const out = single([key], -1n);
    for (const t of this.analysisOf(key).terms) {
      out.addAll(multiply(this.antipodeOfMonomial(t.left), single([t.right])), -BigInt(t.multiplicity));
    }
    this.antipodes.set(key, out);
    return out;
  }

  antipodeOfMonomial(m: Monomial): Combination {
    let acc = single([]);
    for (const k of m) acc = multiply(acc, this.antipode(k));
    return acc;
  }

  /** S applied linearly to a combination of monomials. */
  antipodeOf(x: Combination): Combination {
    const out = new Combination();
    for (const [k, v] of x.terms) out.addAll(this.antipodeOfMonomial(k === '' ? [] : k.split(' * ')), v);
    return out;
  }

  /** Edge indices of an edge set, for callers that hold bitsets. */
  static edgesOf = edgeIndices;
}
