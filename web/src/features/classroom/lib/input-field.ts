import { type Dimension, DIMENSIONS, inputFieldInfo as fieldAt, KINDS } from '@loftwright/buoyancy';

export interface InputFieldInfo {
  /** What the input is, by the kind's schema ("Diameter"), else the path. */
  label: string;
  /** The quantity it holds, where it is a physical one. */
  dimension?: Dimension;
  /** SI unit of the input, '' for a plain number. */
  unit: string;
}

/** Label, dimension and SI unit of the input at a dotted path, from the engine's schema. */
export function inputFieldInfo(kindId: string, path: string): InputFieldInfo {
  const kind = KINDS.find((candidate) => candidate.id === kindId);
  const info = fieldAt(kind?.inputSchema, path);
  const dimension =
    info?.dimension && info.dimension in DIMENSIONS ? (info.dimension as Dimension) : undefined;
  return {
    label: info?.label ?? path,
    ...(dimension ? { dimension } : {}),
    unit: dimension ? DIMENSIONS[dimension].si : '',
  };
}
