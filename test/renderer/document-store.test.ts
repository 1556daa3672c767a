import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it } from 'vitest';
import { ProjectFileError } from '../../src/core/project/index.ts';
import { demoText } from '../../renderer/src/examples.ts';
import { useDocumentStore } from '../../renderer/src/stores/document.ts';

describe('document store', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  function drawBubble() {
    const doc = useDocumentStore();
    doc.newProject('phi4');
    const a = doc.addVertexAt({ x: 0, y: 0 });
    const b = doc.addVertexAt({ x: 120, y: 0 });
    doc.addLine(a, b, 'phi');
    doc.addLine(a, b, 'phi');
    return { doc, a, b };
  }

  it('adds vertices and lines, and validation says why a vertex is wrong', () => {
    const { doc } = drawBubble();
    expect(doc.notation).toBe('1-2 1-2 /');
    expect(doc.validation?.ok).toBe(false);
    if (doc.validation?.ok === false) {
      expect(doc.validation.issues).toHaveLength(2);
      expect(doc.validation.issues[0]!.message).toMatch(/half-edges \(phi,phi\), which is not a vertex of theory phi4/);
      expect(doc.validation.issues[0]!.hint).toMatch(/join 4 lines/);
    }
  });

  it('legs complete the bubble; undo and redo step through the edits', () => {
    const { doc, a, b } = drawBubble();
    doc.addExternalLeg(a, 'phi');
    doc.addExternalLeg(a, 'phi');
    doc.addExternalLeg(b, 'phi');
    doc.addExternalLeg(b, 'phi');
    expect(doc.notation).toBe('1-2 1-2 / 1 1 2 2');
    expect(doc.validation?.ok).toBe(true);
    doc.undo();
    expect(doc.notation).toBe('1-2 1-2 / 1 1 2');
    expect(doc.validation?.ok).toBe(false);
    doc.redo();
    expect(doc.notation).toBe('1-2 1-2 / 1 1 2 2');
    doc.undo();
    doc.undo();
    doc.undo();
    doc.undo();
    doc.undo();
    expect(doc.notation).toBe('1-2 /');
    expect(doc.canRedo).toBe(true);
    doc.addVertexAt({ x: 5, y: 5 });
    expect(doc.canRedo).toBe(false);
  });

  it('deleting a vertex takes its lines and legs; ids of the rest are kept', () => {
    const { doc, a } = drawBubble();
    doc.addExternalLeg(a, 'phi');
    const c = doc.addVertexAt({ x: 0, y: 100 });
    const line = doc.addLine(a, c, 'phi');
    const before = doc.activeGraph!.edges.map((e) => e.id);
    doc.remove([c]);
    expect(doc.activeGraph!.edges.map((e) => e.id)).toEqual(before.filter((id) => id !== line));
    expect(doc.notation).toBe('1-2 1-2 / 1');
  });

  it('the notation box edits the graph, keeping vertex ids and positions', () => {
    const { doc, a } = drawBubble();
    doc.move(new Map([[a, { x: -40, y: 7 }]]));
    expect(doc.applyNotation('1-2 1-2 / 1 1 2 2')).toBeNull();
    const v1 = doc.activeGraph!.vertices.find((v) => v.name === '1')!;
    expect(v1.id).toBe(a);
    expect(v1.position).toEqual({ x: -40, y: 7 });
    expect(doc.validation?.ok).toBe(true);
    const err = doc.applyNotation('1-2 1-');
    expect(err?.name).toBe('InputError');
    expect(doc.notation).toBe('1-2 1-2 / 1 1 2 2');
  });

  it('typing in one session is one undo step', () => {
    const { doc } = drawBubble();
    doc.applyNotation('1-2 1-2 / 1', 's1');
    doc.applyNotation('1-2 1-2 / 1 1', 's1');
    doc.applyNotation('1-2 1-2 / 1 1 2', 's1');
    doc.undo();
    expect(doc.notation).toBe('1-2 1-2 /');
  });

  it('copy and paste of the notation round-trips', () => {
    const doc = useDocumentStore();
    doc.loadText(demoText());
    for (const g of [...doc.graphs]) {
      doc.selectGraph(g.id);
      const text = doc.notation;
      const id = doc.newGraph(text, `${g.name} pasted`);
      expect(doc.activeId).toBe(id);
      expect(doc.notation).toBe(text);
    }
  });

  it('serializes and loads back; the dirty flag follows edits and saves', () => {
    const { doc } = drawBubble();
    expect(doc.dirty).toBe(true);
    const text = doc.serialize();
    doc.markSaved('bubble.coppice.json');
    expect(doc.dirty).toBe(false);
    doc.loadText(text, 'bubble.coppice.json');
    expect(doc.notation).toBe('1-2 1-2 /');
    expect(doc.canUndo).toBe(false);
  });

  it('load errors name the broken field and leave the document alone', () => {
    const doc = useDocumentStore();
    doc.loadText(demoText());
    const name = doc.name;
    expect(() => doc.loadText('{"format":"coppice-project","version":1,"name":"x","theory":{"builtin":"phi4"},"graphs":[{"name":"g"}]}')).toThrow(ProjectFileError);
    try {
      doc.loadText('{"format":"coppice-project","version":1,"name":"x","theory":{"builtin":"phi4"},"graphs":[{"name":"g"}]}');
    } catch (e) {
      expect((e as ProjectFileError).field).toBe('graphs[0].notation');
    }
    expect(doc.name).toBe(name);
  });

  it('theory switch is undoable and re-validates', () => {
    const doc = useDocumentStore();
    doc.loadText(demoText());
    doc.selectGraph(doc.graphs[1]!.id);
    expect(doc.validation?.ok).toBe(true);
    doc.setTheory('phi3');
    expect(doc.validation?.ok).toBe(false);
    doc.undo();
    expect(doc.theory.name).toBe('phi4');
  });
});
