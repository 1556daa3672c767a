/** The example projects bundled with the app (assets/demo), by file name. */
const files = import.meta.glob('../../assets/demo/*.coppice.json', { query: '?raw', import: 'default', eager: true }) as Record<string, string>;

/** The project `npm start` opens. */
export const DEMO_FILE = 'phi4-course.coppice.json';

export interface Example {
  readonly file: string;
  readonly text: string;
}

export const examples: readonly Example[] = Object.entries(files)
  .map(([path, text]) => ({ file: path.split('/').pop()!, text }))
  .sort((a, b) => (a.file === DEMO_FILE ? -1 : b.file === DEMO_FILE ? 1 : a.file.localeCompare(b.file)));


export function demoText(): string {
  return (examples.find((e) => e.file === DEMO_FILE) ?? examples[0]!).text;
}
