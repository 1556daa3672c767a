/** User settings, kept in localStorage (both in the app and in the browser). */
import { defineStore } from 'pinia';
import { ref, watch } from 'vue';

export const SETTINGS_KEY = 'coppice.settings';

interface Saved {
  autosave: boolean;
  autosaveDelayMs: number;
  showVertexNames: boolean;
}

const defaults: Saved = { autosave: true, autosaveDelayMs: 1500, showVertexNames: true };

function readSaved(): Saved {
  try {
    const raw = globalThis.localStorage?.getItem(SETTINGS_KEY);
    const v = raw ? (JSON.parse(raw) as Partial<Saved>) : {};
    return {
      autosave: typeof v.autosave === 'boolean' ? v.autosave : defaults.autosave,
      autosaveDelayMs: typeof v.autosaveDelayMs === 'number' && v.autosaveDelayMs >= 200 ? v.autosaveDelayMs : defaults.autosaveDelayMs,
      showVertexNames: typeof v.showVertexNames === 'boolean' ? v.showVertexNames : defaults.showVertexNames,
    };
  } catch {
    return { ...defaults };
  }
}

export const useSettingsStore = defineStore('settings', () => {
  const saved = readSaved();
  const autosave = ref(saved.autosave);
  const autosaveDelayMs = ref(saved.autosaveDelayMs);
  const showVertexNames = ref(saved.showVertexNames);
  /** Recently opened project files (filled by the desktop app; empty in the browser). */
  const recentFiles = ref<string[]>([]);

  watch([autosave, autosaveDelayMs, showVertexNames], () => {
    try {
      globalThis.localStorage?.setItem(SETTINGS_KEY, JSON.stringify({ autosave: autosave.value, autosaveDelayMs: autosaveDelayMs.value, showVertexNames: showVertexNames.value }));
    } catch {
      // Storage unavailable: settings last for this session only.
    }
  });
  return { autosave, autosaveDelayMs, showVertexNames, recentFiles };
});
