import { KINDS } from '@loftwright/buoyancy';
import { useMemo } from 'react';

/** The JSON Schema of a kind's inputs, as the engine publishes it (empty for an unknown kind). */
export const useInputSchema = (kind: string) =>
  useMemo(() => KINDS.find((candidate) => candidate.id === kind)?.inputSchema ?? {}, [kind]);
