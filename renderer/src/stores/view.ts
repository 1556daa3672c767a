/** Selection and view state of the editor: the tool, the palette's field, the selection, the line being drawn. */
import { defineStore } from 'pinia';
import { ref } from 'vue';

export type Tool = 'select' | 'vertex' | 'line' | 'leg';

export const useViewStore = defineStore('view', () => {
  const tool = ref<Tool>('select');
  /** The palette's current field: new lines and legs get it. */
  const field = ref<string>('phi');
  /** Ids of the selected vertices, lines and legs. */
  const selection = ref<string[]>([]);
  /** The vertex a line starts from, while the line tool waits for its other end. */
  const lineStart = ref<string | null>(null);
  /** Elements the user points at in a panel (highlighted on the canvas). */
  const hovered = ref<string[]>([]);

  function setTool(t: Tool): void {
    tool.value = t;
    lineStart.value = null;
  }
  function select(ids: readonly string[]): void {
    selection.value = [...ids];
  }
  function clearSelection(): void {
    selection.value = [];
  }
  return { tool, field, selection, lineStart, hovered, setTool, select, clearSelection };
});
