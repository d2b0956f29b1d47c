import { ValidateBy, type ValidationOptions } from 'class-validator';

/** The placeholders a tile address may hold, filled in by the web app for each tile. */
const TILE_PLACEHOLDERS = ['{z}', '{x}', '{y}'] as const;

/**
 * What is wrong with a tile server's address template, or null when it will do: an http:// or
 * https:// address on one named host (no `{s}` subdomain lists: the security policy must name
 * the exact origin the browser contacts), no user or password (the web app shows it to every
 * browser), holding each of {z}, {x} and {y} and no other placeholder.
 */
export function mapTileUrlProblem(template: string): string | null {
  const origin = /^(https?):\/\/([^/?#]*)/.exec(template);
  if (!origin) return 'must start with https:// or http://';
  const host = origin[2] ?? '';
  if (host === '' || host.includes('{')) return 'must name one host (no placeholders in it)';
  if (host.includes('@')) return 'must not carry a user name or password';
  const missing = TILE_PLACEHOLDERS.filter((placeholder) => !template.includes(placeholder));
  if (missing.length > 0) return `must contain ${missing.join(', ')}`;
  const others = template.match(/\{[^}]*\}/g)?.filter((part) => !isTilePlaceholder(part)) ?? [];
  if (others.length > 0) return `may hold only {z}, {x} and {y}, not ${others.join(', ')}`;
  if (!tileOrigin(template)) return 'is not a valid address';
  return null;
}

function isTilePlaceholder(part: string): boolean {
  return (TILE_PLACEHOLDERS as readonly string[]).includes(part);
}

/**
 * The origin (scheme, host and port) the browser contacts for a valid template's tiles, e.g.
 * `https://tile.example.org`; undefined when the template is not a valid address.
 */
export function tileOrigin(template: string): string | undefined {
  try {
    return new URL(template.replace(/\{[xyz]\}/g, '0')).origin;
  } catch {
    return undefined;
  }
}

/** MAP_TILE_URL: a valid tile address template (see mapTileUrlProblem), when set. */
export function IsMapTileUrl(options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    {
      name: 'mapTileUrl',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && !mapTileUrlProblem(value),
        defaultMessage: (args) =>
          `MAP_TILE_URL ${typeof args?.value === 'string' ? mapTileUrlProblem(args.value) : 'must be text'}, e.g. https://tile.example.org/{z}/{x}/{y}.png`,
      },
    },
    options,
  );
}

/** MAP_TILE_ATTRIBUTION: required, as non-blank text, whenever MAP_TILE_URL is set. */
export function IsMapTileAttribution(options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    {
      name: 'mapTileAttribution',
      validator: {
        validate: (value: unknown, args) => {
          const tileUrl = (args?.object as { MAP_TILE_URL?: unknown } | undefined)?.MAP_TILE_URL;
          if (tileUrl === undefined) return value === undefined || typeof value === 'string';
          return typeof value === 'string' && value.trim() !== '';
        },
        defaultMessage: () =>
          'MAP_TILE_ATTRIBUTION must be set when MAP_TILE_URL is: the text the tile provider requires under its map',
      },
    },
    options,
  );
}
