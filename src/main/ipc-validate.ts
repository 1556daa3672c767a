/** Payload validation for every IPC channel: the renderer is not trusted to send well-formed data. */
import { z } from 'zod';
import { MAX_PROJECT_FILE_LENGTH } from '../core/project/project-file.ts';

const text = z.string().max(MAX_PROJECT_FILE_LENGTH);
const fileName = z.string().min(1).max(255).refine((s) => !/[\\/\0]/.test(s), 'a file name without slashes');
const absolutePath = z.string().min(1).max(4096).refine((s) => !s.includes('\0') && (s.startsWith('/') || /^[A-Za-z]:[\\/]/.test(s) || s.startsWith('\\\\')), 'an absolute path');

export const payloadSchemas = {
  saveRequest: z.strictObject({ path: absolutePath.optional(), text, suggestedName: fileName, overwrite: z.boolean().optional() }),
  exportRequest: z.strictObject({ text, suggestedName: fileName, format: z.enum(['latex', 'tikz', 'svg', 'json', 'text']) }),
  path: absolutePath,
  autosave: text.nullable(),
  dirty: z.boolean(),
  none: z.tuple([]),
};

/** Thrown back to the renderer when a payload does not have the contract's shape. */
export class PayloadError extends Error {
  constructor(channel: string, detail: string) {
    super(`invalid payload on ${channel}: ${detail}`);
    this.name = 'PayloadError';
  }
}

export function validate<T>(schema: z.ZodType<T>, channel: string, value: unknown): T {
  const r = schema.safeParse(value);
  if (!r.success) {
    const i = r.error.issues[0]!;
    throw new PayloadError(channel, `${i.path.join('.') || 'value'}: ${i.message}`);
  }
  return r.data;
}
