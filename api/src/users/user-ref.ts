import type { UserRef } from '@loftwright/contract';

export type { UserRef };

/** Display names by user id; an id of a deleted account reads "unknown user", null stays null. */
export type NameLookup = (id: string | null) => UserRef | null;
