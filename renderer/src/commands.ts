/**
 * Everything the user can do from a button, a key or the native menu, in one place, so the
 * three stay in step. File commands go through the Platform (desktop bridge or browser fallback).
 */
import type { Ref } from 'vue';
import { CoppiceError, parseNotation, printNotation } from '../../src/core/index.ts';
import { isSaveConflict, type GraphLink, type MenuCommand } from '../../src/core/project/ipc-contract.ts';
import { toEngineGraph } from '../../src/core/project/index.ts';
import type { Platform } from './platform/platform.ts';
import { useDocumentStore } from './stores/document.ts';
import { useSettingsStore } from './stores/settings.ts';
import { useViewStore, type Tool } from './stores/view.ts';

export interface CanvasApi {
  fit(): void;
  zoomBy(f: number): void;
  autoLayout(): void;
  selectAll(): void;
}

export type Notice = { kind: 'info' | 'error'; text: string; action?: { label: string; run: () => void } } | null;

export function useCommands(platform: Platform, canvas: Ref<CanvasApi | null>, notice: Ref<Notice>) {
  const doc = useDocumentStore();
  const view = useViewStore();
  const settings = useSettingsStore();

  const say = (kind: 'info' | 'error', text: string) => (notice.value = { kind, text });
  const okToDiscard = () => !doc.dirty || globalThis.confirm?.(`Discard the unsaved changes to “${doc.name}”?`) !== false;

  function openText(text: string, path: string | null, saved = true): boolean {
    try {
      doc.loadText(text, path, saved);
      view.clearSelection();
      view.lineStart = null;
      return true;
    } catch (e) {
      say('error', `Could not open ${path ?? 'the project'}: ${e instanceof CoppiceError ? e.describe() : String(e)}`);
      return false;
    }
  }

  async function open(): Promise<void> {
    if (!okToDiscard()) return;
    const f = await platform.openProject();
    if (f && openText(f.text, f.path)) {
      say('info', `Opened ${doc.fileName}.`);
      void refreshRecent();
    }
  }
  async function openRecent(path: string): Promise<void> {
    if (!okToDiscard()) return;
    const f = await platform.openRecent(path);
    if (f && openText(f.text, f.path)) say('info', `Opened ${doc.fileName}.`);
    else if (!f) say('error', `${path} could not be read.`);
  }
  async function save(as = false, overwrite = false): Promise<void> {
    const req = {
      text: doc.serialize(),
      suggestedName: doc.fileName,
      ...(!as && doc.filePath && platform.kind === 'desktop' ? { path: doc.filePath } : {}),
      ...(overwrite ? { overwrite: true } : {}),
    };
    try {
      const path = as ? await platform.saveProjectAs(req) : await platform.saveProject(req);
      if (isSaveConflict(path)) {
        // Changed on disk since it was opened: nothing is written until the user chooses.
        notice.value = { kind: 'error', text: `Not saved: ${path.message}. Overwrite it, or use Save As to keep both.`, action: { label: 'Overwrite', run: () => void save(false, true) } };
        return;
      }
      if (!path) return;
      doc.markSaved(path);
      await platform.autosave(null);
      say('info', platform.kind === 'desktop' ? `Saved ${path}.` : `Saved as a download: ${path}.`);
      void refreshRecent();
    } catch (e) {
      say('error', `Saving failed: ${(e as Error).message}`);
    }
  }
  async function exportAs(format: 'json' | 'text'): Promise<void> {
    const base = doc.fileName.replace(/\.coppice\.json$/, '');
    const text =
      format === 'json'
        ? doc.serialize()
        : [`# ${doc.name} (theory ${doc.theory.name})`, ...doc.graphs.map((g) => `${g.name}\t${printNotation(toEngineGraph(g).graph, { defaultField: doc.theory.defaultField })}`)].join('\n') + '\n';
    const path = await platform.exportFile({ text, suggestedName: format === 'json' ? `${base}.export.json` : `${base}.txt`, format });
    if (path) say('info', `Exported ${path}.`);
  }
  function newProject(theoryName = doc.theory.name): void {
    if (!okToDiscard()) return;
    doc.newProject(theoryName);
    view.clearSelection();
  }
  async function refreshRecent(): Promise<void> {
    settings.recentFiles = [...(await platform.recentFiles())];
  }

  function deleteSelection(): void {
    if (view.selection.length) doc.remove(view.selection);
    view.clearSelection();
  }
  function reverse(): void {
    if (view.selection.length) doc.reverse(view.selection);
  }
  function setTool(t: Tool): void {
    view.setTool(t);
  }
  async function copyNotation(): Promise<void> {
    try {
      await navigator.clipboard.writeText(doc.notation);
      say('info', `Copied “${doc.notation}”.`);
    } catch {
      say('error', 'The clipboard is not available here; select the notation box and copy from it.');
    }
  }
  function pasteGraph(text: string, name?: string): void {
    try {
      parseNotation(text.trim());
    } catch (e) {
      say('error', `Not a graph in the compact notation: ${e instanceof CoppiceError ? e.describe() : String(e)}`);
      return;
    }
    doc.newGraph(text.trim(), name ?? 'pasted graph');
    say('info', 'Pasted as a new graph.');
  }
  async function pasteNotation(): Promise<void> {
    try {
      pasteGraph(await navigator.clipboard.readText());
    } catch {
      say('error', 'The clipboard is not available here; type or paste into the notation box of a new graph.');
    }
  }
  function openLink(link: GraphLink): void {
    if (link.theory && link.theory !== doc.theory.name && doc.graphs.length) {
      if (!okToDiscard()) return;
      doc.newProject(link.theory);
    }
    pasteGraph(link.notation, link.name ?? 'linked graph');
  }

  const menu: Record<MenuCommand, () => void> = {
    new: () => newProject(),
    open: () => void open(),
    save: () => void save(false),
    'save-as': () => void save(true),
    'export-json': () => void exportAs('json'),
    'export-text': () => void exportAs('text'),
    undo: () => doc.undo(),
    redo: () => doc.redo(),
    delete: deleteSelection,
    'select-all': () => canvas.value?.selectAll(),
    'copy-notation': () => void copyNotation(),
    'paste-notation': () => void pasteNotation(),
    layout: () => canvas.value?.autoLayout(),
    fit: () => canvas.value?.fit(),
    'zoom-in': () => canvas.value?.zoomBy(1.25),
    'zoom-out': () => canvas.value?.zoomBy(0.8),
    'new-graph': () => doc.newGraph(),
  };

  /** Keyboard shortcuts of the editor (ignored while typing in a text field). */
  function onKey(e: KeyboardEvent): void {
    const t = e.target as HTMLElement | null;
    const typing = !!t && (t.tagName === 'INPUT' || t.tagName === 'TEXTAREA' || t.tagName === 'SELECT' || t.isContentEditable);
    const mod = e.ctrlKey || e.metaKey;
    const k = e.key.toLowerCase();
    if (mod && k === 's') return void (e.preventDefault(), save(e.shiftKey));
    if (mod && k === 'o') return void (e.preventDefault(), open());
    if (typing) return;
    if (mod && k === 'z') return void (e.preventDefault(), e.shiftKey ? doc.redo() : doc.undo());
    if (mod && k === 'y') return void (e.preventDefault(), doc.redo());
    if (mod && k === 'a') return void (e.preventDefault(), canvas.value?.selectAll());
    if (mod) return;
    if (k === 'delete' || k === 'backspace') return void (e.preventDefault(), deleteSelection());
    if (k === 'escape') return void (view.lineStart ? (view.lineStart = null) : view.setTool('select'));
    const tools: Record<string, Tool> = { s: 'select', v: 'vertex', l: 'line', e: 'leg' };
    if (tools[k]) return setTool(tools[k]!);
    if (k === 'r') return reverse();
    if (k === 'f') return canvas.value?.fit();
    if (k === '+' || k === '=') return canvas.value?.zoomBy(1.25);
    if (k === '-') return canvas.value?.zoomBy(0.8);
    if (/^[1-9]$/.test(k)) {
      const f = doc.theory.fields[Number(k) - 1];
      if (f) {
        view.field = f.name;
        const lines = view.selection.filter((id) => doc.activeGraph?.edges.some((x) => x.id === id) || doc.activeGraph?.legs.some((x) => x.id === id));
        if (lines.length) doc.setFieldOf(lines, f.name);
      }
    }
  }

  return { open, openRecent, openText, save, exportAs, newProject, refreshRecent, deleteSelection, reverse, setTool, copyNotation, pasteGraph, pasteNotation, openLink, menu, onKey, okToDiscard };
}
