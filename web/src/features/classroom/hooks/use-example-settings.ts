import { App } from 'antd';
import { useState } from 'react';
import {
  type ExampleDetail,
  type RevealRule,
  type TryRanges,
  useUpdateExample,
} from '../api/classroom-api';

/**
 * The settings of a published example as the teacher edits them, and saving them: empty step
 * notes are left out, the exercise only when it is one.
 */
export function useExampleSettings(example: ExampleDetail) {
  const { message } = App.useApp();
  const update = useUpdateExample(example.id);
  const [intro, setIntro] = useState(example.intro);
  const [notes, setNotes] = useState<Record<string, string>>(example.stepNotes);
  const [ranges, setRanges] = useState<TryRanges>(example.tryRanges);
  const [chartStepId, setChartStepId] = useState<string | null>(example.chartStepId);
  const [isExercise, setIsExercise] = useState(example.exercise !== null);
  const [hidden, setHidden] = useState<string[]>(example.exercise?.hiddenOutputs ?? []);
  const [tolerance, setTolerance] = useState<number>(example.exercise?.tolerancePercent ?? 2);
  const [reveal, setReveal] = useState<RevealRule>(example.exercise?.reveal ?? 'after-correct');
  const [revealAfterAttempts, setRevealAfterAttempts] = useState<number>(
    example.exercise?.revealAfterAttempts ?? 3,
  );

  const save = () =>
    update.mutate(
      {
        intro,
        stepNotes: Object.fromEntries(Object.entries(notes).filter(([, note]) => note.trim())),
        tryRanges: ranges,
        chartStepId,
        exercise: isExercise
          ? {
              hiddenOutputs: hidden,
              tolerancePercent: tolerance,
              reveal,
              ...(reveal === 'after-attempts' ? { revealAfterAttempts } : {}),
            }
          : null,
      },
      { onSuccess: () => void message.success('Example settings saved') },
    );

  return {
    intro,
    setIntro,
    notes,
    setNote: (stepId: string, note: string) => setNotes((now) => ({ ...now, [stepId]: note })),
    ranges,
    setRanges,
    chartStepId,
    setChartStepId,
    exercise: {
      isExercise,
      setIsExercise,
      hidden,
      setHidden,
      tolerance,
      setTolerance,
      reveal,
      setReveal,
      revealAfterAttempts,
      setRevealAfterAttempts,
    },
    save,
    saving: update.isPending,
    error: update.error,
  };
}

export type ExerciseSettingsFields = ReturnType<typeof useExampleSettings>['exercise'];
