import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import IssueList from '../../renderer/src/components/IssueList.vue';
import NotationBox from '../../renderer/src/components/NotationBox.vue';
import PowerCounting from '../../renderer/src/components/PowerCounting.vue';
import { browserPlatform, RECOVERY_KEY } from '../../renderer/src/platform/platform.ts';
import { useDocumentStore } from '../../renderer/src/stores/document.ts';
import { useStructureStore } from '../../renderer/src/stores/structure.ts';

describe('panels', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('the notation box follows the canvas, and the canvas follows valid text', async () => {
    const doc = useDocumentStore();
    doc.newProject('phi4');
    const w = mount(NotationBox);
    const box = w.get('[data-testid=notation-input]');
    const a = doc.addVertexAt({ x: 0, y: 0 });
    doc.addExternalLeg(a, 'phi');
    await flushPromises();
    expect((box.element as HTMLTextAreaElement).value).toBe('/ 1');
    await box.trigger('focus');
    await box.setValue('1-2 1-2 / 1 1 2 2');
    expect(doc.activeGraph!.edges).toHaveLength(2);
    expect(doc.activeGraph!.vertices[0]!.id).toBe(a);
    await box.setValue('1-2 1-2 / 1 1 2 2 ?');
    expect(w.get('[data-testid=notation-error]').text()).toMatch(/character 19/);
    expect(doc.activeGraph!.edges).toHaveLength(2);
  });

  it('validation lists problems, power counting reports the bubble', async () => {
    const doc = useDocumentStore();
    doc.newProject('phi4');
    const issues = mount(IssueList);
    const power = mount(PowerCounting);
    doc.applyNotation('1-2 1-2 / 1 1 2');
    await flushPromises();
    expect(issues.get('[data-testid=validation-status]').text()).toMatch(/1 problem/);
    expect(issues.get('[data-testid=validation-issue]').text()).toMatch(/vertex 2.*not a vertex of theory phi4/);
    doc.applyNotation('1-2 1-2 / 1 1 2 2');
    await flushPromises();
    expect(issues.get('[data-testid=validation-status]').text()).toMatch(/✓/);
    await vi.waitFor(() => expect(power.find('[data-testid=pc-loops]').exists()).toBe(true), { timeout: 3000 });
    expect(power.get('[data-testid=pc-loops]').text()).toBe('1');
    expect(power.get('[data-testid=pc-omega]').text()).toBe('0');
    expect(power.get('[data-testid=pc-divergent]').text()).toMatch(/yes/);
    expect(useStructureStore().status).toBe('done');
    expect(power.get('[data-testid=pc-symmetry]').text()).toMatch(/S=2/);
  });

  it('the browser fallback autosaves to localStorage and offers it back', async () => {
    localStorage.clear();
    const p = browserPlatform(localStorage);
    expect((await p.startup()).recovery).toBeUndefined();
    await p.autosave('{"x":1}');
    expect(localStorage.getItem(RECOVERY_KEY)).toBe('{"x":1}');
    expect((await p.startup()).recovery?.text).toBe('{"x":1}');
    await p.autosave(null);
    expect(localStorage.getItem(RECOVERY_KEY)).toBeNull();
    expect(await p.recentFiles()).toEqual([]);
  });
});
