/**
 * PostgreSQL's form of the SQLite triggers that keep stored content unchangeable (migrations
 * 1764640800000 and 1764734400000): the same columns, the same refusal, the same message, so
 * the API answers a refused change the same way on both databases (database-errors.ts).
 * `UPDATE OF` fires when a listed column is in the statement's SET list, as in SQLite.
 */
export const IMMUTABLE_MESSAGES = {
  version: 'calculation versions are immutable',
  versionDelete: 'calculation versions are never deleted',
  workedExample: 'worked example content is immutable',
} as const;

export const POSTGRES_IMMUTABILITY_SQL = [
  // The message comes from the trigger's argument, so one function serves every rule.
  `CREATE FUNCTION "loftwright_refuse_change"() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    RAISE EXCEPTION '%', TG_ARGV[0] USING ERRCODE = 'restrict_violation';
  END
  $$`,
  `CREATE TRIGGER "trg_version_content_immutable"
    BEFORE UPDATE OF "calculation_id", "number", "inputs", "outputs", "steps", "warnings", "series",
      "engine_version", "author_id", "note", "fingerprint", "created_at" ON "calculation_version"
    FOR EACH ROW EXECUTE FUNCTION "loftwright_refuse_change"('${IMMUTABLE_MESSAGES.version}')`,
  `CREATE TRIGGER "trg_version_no_delete" BEFORE DELETE ON "calculation_version"
    FOR EACH ROW EXECUTE FUNCTION "loftwright_refuse_change"('${IMMUTABLE_MESSAGES.versionDelete}')`,
  `CREATE TRIGGER "trg_worked_example_content_immutable"
    BEFORE UPDATE OF "calculation_id", "version_number", "kind", "inputs", "outputs", "steps",
      "warnings", "series", "engine_version", "fingerprint" ON "worked_example"
    FOR EACH ROW EXECUTE FUNCTION "loftwright_refuse_change"('${IMMUTABLE_MESSAGES.workedExample}')`,
];
