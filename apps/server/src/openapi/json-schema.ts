import { z } from 'zod';

type Json = Record<string, unknown>;

/**
 * Converts a zod schema to a JSON Schema for an OpenAPI 3.1 document (whose schema dialect is JSON Schema
 * 2020-12). zod puts shared and recursive parts under the schema's own `$defs` and points at them with
 * `#/$defs/...` (and at its root with `#`); inside a larger document those pointers would resolve against
 * the document's root, so the parts move to `components` (through `addComponent`) and the pointers follow.
 * `scope` names the parts that have no id of their own, so two routes never share a name by accident.
 */
export function openApiSchema(schema: z.ZodType, io: 'input' | 'output', scope: string, addComponent: (name: string, schema: Json) => void): Json {
  let converted: Json;
  try {
    converted = z.toJSONSchema(schema, { io, unrepresentable: 'any', target: 'draft-2020-12' }) as Json;
  } catch (err) {
    // A schema zod cannot express (a custom check it cannot see through) still documents the route.
    return { description: `(no JSON Schema: ${err instanceof Error ? err.message : String(err)})` };
  }
  const { $schema: _dialect, $defs, ...root } = converted;
  const names = new Map<string, string>();
  for (const name of Object.keys(($defs as Json | undefined) ?? {})) names.set(name, componentName(name, scope));
  let selfReferenced = false;
  const rewrite = (node: unknown): unknown => {
    if (Array.isArray(node)) return node.map(rewrite);
    if (node === null || typeof node !== 'object') return node;
    const out: Json = {};
    for (const [key, value] of Object.entries(node)) {
      if (key === '$ref' && typeof value === 'string') {
        if (value === '#') {
          selfReferenced = true;
          out[key] = `#/components/schemas/${componentName('', scope)}`;
        } else if (value.startsWith('#/$defs/')) {
          const name = decodeURIComponent(value.slice('#/$defs/'.length));
          out[key] = `#/components/schemas/${names.get(name) ?? componentName(name, scope)}`;
        } else {
          out[key] = value;
        }
      } else {
        out[key] = rewrite(value);
      }
    }
    return out;
  };
  for (const [name, def] of Object.entries(($defs as Json | undefined) ?? {})) addComponent(names.get(name)!, rewrite(def) as Json);
  const result = rewrite(root) as Json;
  if (!selfReferenced) return result;
  addComponent(componentName('', scope), result);
  return { $ref: `#/components/schemas/${componentName('', scope)}` };
}

/** Component names allow letters, digits, '.', '-' and '_'; zod's generated names (`__schema0`) get the scope. */
function componentName(name: string, scope: string): string {
  const own = name === '' ? scope : /^__schema\d+$/.test(name) ? `${scope}_${name.slice(2)}` : name;
  return own.replace(/[^A-Za-z0-9._-]/g, '_');
}
