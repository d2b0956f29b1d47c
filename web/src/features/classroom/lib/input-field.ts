import { KINDS } from '@loftwright/buoyancy';

type Schema = Record<string, unknown>;

const asSchema = (value: unknown): Schema =>
  value && typeof value === 'object' ? (value as Schema) : {};

/** The variant of a union that the given value is: every constant property must match. */
function variantFor(node: Schema, value: unknown): Schema {
  const variants = (node.oneOf ?? node.anyOf) as Schema[] | undefined;
  if (!variants) return node;
  const given = asSchema(value);
  return (
    variants.find((variant) =>
      Object.entries(asSchema(variant.properties)).every(([key, property]) => {
        const constant = asSchema(property).const;
        return constant === undefined || given[key] === constant;
      }),
    ) ?? node
  );
}

export interface InputFieldInfo {
  /** What the input is, from the kind's schema ("diameter"), else the path. */
  label: string;
  /** SI unit of the input, '' for a plain number. */
  unit: string;
}

/** Label and unit of the input at a dotted path, read from the kind's published JSON Schema. */
export function inputFieldInfo(kindId: string, inputs: unknown, path: string): InputFieldInfo {
  const kind = KINDS.find((candidate) => candidate.id === kindId);
  let node: Schema = asSchema(kind?.inputSchema);
  let value: unknown = inputs;
  const labels: string[] = [];
  for (const key of path.split('.')) {
    node = variantFor(node, value);
    node = variantFor(asSchema(asSchema(node.properties)[key]), asSchema(value)[key]);
    value = asSchema(value)[key];
    if (typeof node.description === 'string') labels.push(node.description);
  }
  const label = labels.at(-1) ?? path;
  const parent = labels.length > 1 ? labels.at(-2) : undefined;
  return {
    label: parent && !/^[A-Z]/.test(label) ? `${label} (${parent.toLowerCase()})` : label,
    unit: typeof node.unit === 'string' ? node.unit : '',
  };
}
