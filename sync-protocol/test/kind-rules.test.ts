import { readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { RECORD_KINDS, kindRules, kindSpec, mergeRuleOf, isImmutableField } from '../src/index.js';

const src = fileURLToPath(new URL('../src/', import.meta.url));

/** Every module `file` loads at run time (type-only imports are erased), following relative imports. */
function runtimeImports(file: string, seen = new Set<string>()): Set<string> {
  if (seen.has(file)) return seen;
  seen.add(file);
  const text = readFileSync(file, 'utf8');
  for (const m of text.matchAll(/^\s*(?:import|export)\s+(type\s+)?(?:[^'";]*?\s+from\s+)?'([^']+)'/gm)) {
    if (m[1]) continue;
    const spec = m[2]!;
    if (!spec.startsWith('.')) {
      seen.add(spec);
      continue;
    }
    runtimeImports(resolve(dirname(file), spec.replace(/\.js$/, '.ts')), seen);
  }
  return seen;
}

describe('kind rules apart from the schemas', () => {
  it.each(RECORD_KINDS)('%s: the spec is its rules with a schema added', (kind) => {
    const { schema, ...rules } = kindSpec(kind);
    expect(schema).toBeDefined();
    expect(rules).toEqual(kindRules(kind));
  });

  it('answers merge rules and fixed fields from the rules', () => {
    expect(mergeRuleOf('defect', 'status')).toBe('defect-status');
    expect(mergeRuleOf('defect', 'description')).toBe('lww');
    expect(isImmutableField('check', 'templateId')).toBe(true);
    expect(isImmutableField('check', 'status')).toBe(false);
  });

  it('names an unknown kind', () => {
    expect(() => kindRules('boats' as never)).toThrow('Unknown record kind "boats". Known kinds: boat, motor');
  });

  // A phone's first screen reads records, merges pending changes and asks who may do what; if
  // any of these modules loaded zod, that screen would carry the whole validator.
  it.each(['kind-rules.ts', 'permissions.ts', 'merge.ts', 'replica.ts', 'derive/index.ts', 'field-labels.ts'])(
    '%s loads no zod',
    (file) => {
      const loaded = runtimeImports(join(src, file));
      expect([...loaded].filter((m) => m === 'zod' || m.startsWith('zod/'))).toEqual([]);
      // The walk does follow the imports: kind-rules reaches every kind's rules.
      if (file === 'kind-rules.ts') expect(loaded).toContain(join(src, 'kinds/defect-rules.ts'));
    },
  );
});
