// Every field name the shared zod schemas know, found by loading each *-schema(s).ts module: the keys a hostile body fills.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { projectRoot } from '../../database/scripts/runtime-dir.js';

type Shape = Record<string, unknown>;

/** The object shape under a schema, through zod 4's wrappers (optional, nullable, refine, pipe, array). */
function shapesOf(schema: unknown, seen: Set<unknown>, found: Shape[]): void {
  if (!schema || typeof schema !== 'object' || seen.has(schema)) return;
  seen.add(schema);
  const def = (schema as { def?: Record<string, unknown> }).def;
  if (!def) return;
  const shape = (schema as { shape?: Shape }).shape;
  if (shape && typeof shape === 'object') {
    found.push(shape);
    for (const inner of Object.values(shape)) shapesOf(inner, seen, found);
  }
  for (const key of ['innerType', 'in', 'out', 'element', 'schema']) shapesOf(def[key], seen, found);
  for (const option of (def.options as unknown[] | undefined) ?? []) shapesOf(option, seen, found);
}

function schemaFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return schemaFiles(path);
    return /-schemas?\.ts$/.test(entry.name) ? [path] : [];
  });
}

export async function schemaFieldNames(): Promise<string[]> {
  const names = new Set<string>();
  const seen = new Set<unknown>();
  for (const file of schemaFiles(join(projectRoot, 'shared'))) {
    const module = (await import(pathToFileURL(file).href)) as Record<string, unknown>;
    const shapes: Shape[] = [];
    for (const value of Object.values(module)) shapesOf(value, seen, shapes);
    for (const shape of shapes) for (const key of Object.keys(shape)) names.add(key);
  }
  return [...names].sort();
}
