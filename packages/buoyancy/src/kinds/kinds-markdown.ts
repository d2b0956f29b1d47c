import { KINDS } from './registry.js';

type Schema = Record<string, unknown>;

interface FieldRow {
  readonly path: string;
  readonly type: string;
  readonly unit: string;
  readonly range: string;
  readonly fallback: string;
  readonly description: string;
}

const asSchema = (value: unknown): Schema =>
  value && typeof value === 'object' ? (value as Schema) : {};

/** A choice's value, with its title where the title says more than the value itself. */
function choiceOf(value: unknown, titles: Schema): string {
  const title = titles[String(value)];
  const plain = String(value).replace(/-/g, ' ').toLowerCase();
  return typeof title === 'string' && title.toLowerCase() !== plain
    ? `\`${String(value)}\` (${title})`
    : `\`${String(value)}\``;
}

function typeOf(schema: Schema): string {
  if (Array.isArray(schema.enum))
    return schema.enum.map((value) => choiceOf(value, asSchema(schema.enumTitles))).join(', ');
  if (schema.const !== undefined) return `\`${String(schema.const)}\``;
  if (schema.type === 'array') return `list of ${typeOf(asSchema(schema.items))}`;
  return typeof schema.type === 'string' ? schema.type : 'value';
}

function discriminatorOf(variant: Schema): string | undefined {
  const properties = asSchema(variant.properties);
  for (const [key, property] of Object.entries(properties)) {
    if (asSchema(property).const !== undefined)
      return `${key}: ${String(asSchema(property).const)}`;
  }
  return undefined;
}

function collect(schema: Schema, path: string, required: boolean, rows: FieldRow[]): void {
  const variants = (schema.oneOf ?? schema.anyOf) as Schema[] | undefined;
  if (Array.isArray(variants)) {
    for (const variant of variants) {
      const label = discriminatorOf(variant);
      collect(variant, label ? `${path} (${label})` : path, required, rows);
    }
    return;
  }
  if (schema.type === 'object' && schema.properties) {
    const requiredKeys = new Set((schema.required as string[] | undefined) ?? []);
    for (const [key, property] of Object.entries(asSchema(schema.properties))) {
      const child = asSchema(property);
      if (child.const !== undefined) continue;
      collect(child, path === '' ? key : `${path}.${key}`, requiredKeys.has(key), rows);
    }
    return;
  }
  if (schema.type === 'array' && asSchema(schema.items).type === 'object') {
    collect(asSchema(schema.items), `${path}[]`, required, rows);
    return;
  }
  const hasRange = typeof schema.minimum === 'number' || typeof schema.maximum === 'number';
  rows.push({
    path,
    type: typeOf(schema),
    unit: typeof schema.unit === 'string' ? schema.unit : '',
    range: hasRange ? `${String(schema.minimum ?? '−∞')} … ${String(schema.maximum ?? '∞')}` : '',
    fallback:
      schema.default !== undefined
        ? `\`${JSON.stringify(schema.default)}\``
        : required
          ? 'required'
          : 'optional',
    description: typeof schema.description === 'string' ? schema.description : '',
  });
}

/**
 * The reference page of every calculation kind: what it computes and each input field with its
 * type, SI unit, allowed range and default, rendered from the kinds' own schemas so the page
 * cannot drift from the code (a test compares it with docs/calculation-kinds.md).
 */
export function kindsMarkdown(): string {
  const lines = [
    '# Calculation kinds',
    '',
    'Generated from the engine’s input schemas by `npm run docs:kinds`; do not edit by hand.',
    'Every kind is evaluated with `evaluate(kind, inputs)` from `@loftwright/buoyancy`',
    '(`POST /api/evaluate` in the API). Inputs are SI numbers; a field marked with a variant, such as',
    '`ambient (mode: standard)`, exists when its object has that discriminator value.',
    '',
  ];
  for (const kind of KINDS) {
    const rows: FieldRow[] = [];
    collect(kind.inputSchema, '', true, rows);
    lines.push(`## ${kind.title} (\`${kind.id}\`)`, '', kind.description, '');
    lines.push(
      '| field | type | unit | range | default | meaning |',
      '| --- | --- | --- | --- | --- | --- |',
    );
    for (const row of rows) {
      lines.push(
        `| \`${row.path}\` | ${row.type} | ${row.unit} | ${row.range} | ${row.fallback} | ${row.description} |`,
      );
    }
    lines.push('', 'Example:', '', '```json', JSON.stringify(kind.example, null, 2), '```', '');
  }
  return lines.join('\n');
}
