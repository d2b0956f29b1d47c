import { useState } from 'react';

/**
 * The inputs being edited, the last saved ones they are compared with, and the change note.
 * `dirty` says the inputs differ from what is saved.
 */
export function useCalculationDraft(saved: unknown) {
  const [inputs, setInputs] = useState<unknown>(() => saved);
  const [savedInputs, setSavedInputs] = useState<string>(() => JSON.stringify(saved));
  const [note, setNote] = useState('');
  return {
    inputs,
    setInputs,
    note,
    setNote,
    dirty: inputs !== undefined && JSON.stringify(inputs) !== savedInputs,
    /** Takes inputs the server holds (just saved, or another's version) as both typed and saved. */
    takeSaved: (next: unknown) => {
      setSavedInputs(JSON.stringify(next));
      setInputs(next);
    },
  };
}
