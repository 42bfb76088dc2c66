import type { z } from "zod";

/**
 * Where a value carries object keys its schema does not name. zod's plain objects strip such keys
 * silently, so a client that sends `orgId`, `role` or `createdBy` would never learn they were ignored;
 * the body reader refuses them instead (422 naming each one). Walking the schema here, once, keeps every
 * write schema strict without each one having to say `.strict()`.
 *
 * Called only after the value parsed, so each branch can trust the value's shape. Keys under a
 * transform's output, a record or an object with a catch-all are not checked: the schema chose to accept them.
 */
export function unknownFields(schema: z.ZodType, value: unknown, path: string[] = []): string[] {
  const def = defOf(schema);
  switch (def.type) {
    case "object": {
      if (!isPlainObject(value)) return [];
      const shape = def.shape ?? {};
      const found: string[] = [];
      for (const [key, child] of Object.entries(value)) {
        // Own keys only: "constructor" or "__proto__" in a body must not find Object's.
        const field = Object.hasOwn(shape, key) ? shape[key] : undefined;
        if (field) found.push(...unknownFields(field, child, [...path, key]));
        else if (!def.catchall || kind(def.catchall) === "never") found.push([...path, key].join("."));
      }
      return found;
    }
    case "optional":
    case "nullable":
    case "default":
    case "prefault":
    case "nonoptional":
    case "readonly":
    case "catch":
      return value === undefined || value === null ? [] : unknownFields(def.innerType!, value, path);
    case "pipe":
      return unknownFields(def.in!, value, path);
    case "lazy":
      return unknownFields(def.getter!(), value, path);
    case "array":
      return Array.isArray(value) ? value.flatMap((item, i) => unknownFields(def.element!, item, [...path, String(i)])) : [];
    case "tuple":
      return Array.isArray(value)
        ? value.flatMap((item, i) => {
            const item_ = def.items?.[i] ?? def.rest;
            return item_ ? unknownFields(item_, item, [...path, String(i)]) : [];
          })
        : [];
    case "union": {
      // The option the value actually matches decides which keys are known.
      const option = def.options?.find((o) => o.safeParse(value).success);
      return option ? unknownFields(option, value, path) : [];
    }
    case "intersection": {
      const left = unknownFields(def.left!, value, path);
      const right = new Set(unknownFields(def.right!, value, path));
      return left.filter((key) => right.has(key));
    }
    default:
      return [];
  }
}

interface ZodDef {
  type: string;
  shape?: Record<string, z.ZodType>;
  catchall?: z.ZodType;
  innerType?: z.ZodType;
  in?: z.ZodType;
  getter?: () => z.ZodType;
  element?: z.ZodType;
  items?: z.ZodType[];
  rest?: z.ZodType | null;
  options?: z.ZodType[];
  left?: z.ZodType;
  right?: z.ZodType;
}

const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: ZodDef } })._zod.def;
const kind = (schema: z.ZodType) => defOf(schema).type;

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}
