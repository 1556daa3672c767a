/** Brings a Cytoscape instance in line with a list of element definitions, touching only what changed. */
import type { Core, ElementDefinition } from 'cytoscape';

export function syncElements(cy: Core, els: readonly ElementDefinition[], opts: { keepPositionsOf?: ReadonlySet<string> } = {}): void {
  const wanted = new Map(els.map((e) => [e.data.id!, e]));
  cy.batch(() => {
    cy.elements().forEach((ele) => {
      const def = wanted.get(ele.id());
      // An edge whose ends changed cannot be updated in place.
      if (!def || (ele.isEdge() && (ele.data('source') !== def.data.source || ele.data('target') !== def.data.target))) ele.remove();
    });
    const added: ElementDefinition[] = [];
    for (const def of els) {
      const ele = cy.getElementById(def.data.id!);
      if (ele.empty()) {
        added.push(def);
        continue;
      }
      ele.data(def.data);
      ele.classes(typeof def.classes === 'string' ? def.classes : '');
      if (def.position && ele.isNode() && !opts.keepPositionsOf?.has(ele.id())) {
        const p = ele.position();
        if (p.x !== def.position.x || p.y !== def.position.y) ele.position({ ...def.position });
      }
    }
    // Nodes before edges, so every edge finds its ends.
    cy.add(added.filter((d) => d.group === 'nodes'));
    cy.add(added.filter((d) => d.group !== 'nodes'));
  });
}
