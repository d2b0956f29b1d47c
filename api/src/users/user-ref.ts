/** A user as other records show them: id and display name, never the e-mail or roles. */
export interface UserRef {
  id: string;
  displayName: string;
}

/** Display names by user id; an id of a deleted account reads "unknown user", null stays null. */
export type NameLookup = (id: string | null) => UserRef | null;
