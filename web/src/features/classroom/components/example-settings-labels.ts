import type { FieldLabels } from '@/lib/readable-api-error';
import type { ExampleDetail } from '../api/classroom-api';
import { inputFieldInfo } from '../lib/input-field';

/** The settings form's labels for the fields the server names in a refusal. */
export const exampleSettingsLabels =
  (example: ExampleDetail): FieldLabels =>
  (field) => {
    if (field.startsWith('tryRanges.')) {
      const info = inputFieldInfo(example.kind, field.slice('tryRanges.'.length));
      return {
        label: `Range of ${info.label.toLowerCase()} for trying`,
        ...(info.dimension ? { dimension: info.dimension } : {}),
      };
    }
    if (field.startsWith('stepNotes.')) {
      const step = example.steps.find((candidate) => `stepNotes.${candidate.id}` === field);
      return { label: `Note on “${step?.label ?? field.slice('stepNotes.'.length)}”` };
    }
    if (field === 'chartStepId') return { label: 'Chart' };
    if (field === 'exercise.hiddenOutputs') return { label: 'Results the students work out' };
    return undefined;
  };
