import { Input, Typography } from 'antd';
import { InputError } from '@loftwright/buoyancy';
import { useId, useState } from 'react';
import { useReportUnreadable } from './unreadable-fields';

/** What a field made of a person's text. */
export interface TextReading {
  value: number;
  /** What was understood, in words and units: "1.58 m", "0.25 EUR/kWh". */
  readAs: string;
}

export interface ReadingInputProps {
  /** Accessible name, also the field's label in messages. */
  label: string;
  /** The value, or undefined while the text does not read as one. */
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  /** Reads the person's text; throws InputError with the reason when it does not read. */
  read: (text: string) => TextReading;
  /** The text a value from outside is shown as, for editing. */
  display: (value: number) => string;
  /** Why a value that reads is still refused (outside its range), if it is. */
  check?: (value: number) => string | undefined;
  /** A problem found elsewhere (the engine's check of the whole form, the server). */
  externalProblem?: string;
  /** A "check this" note: the value reads and is allowed but is seldom met. It never blocks. */
  note?: string;
  /** Changes when values are shown differently (unit system, number format): the text is redone. */
  displayKey: string;
  id?: string;
  disabled?: boolean;
  placeholder?: string;
}

/**
 * A text field that reads a person's typing by the one reading rule and says, beside it, what it
 * understood or why it cannot read it. Text that does not read is kept as typed, never reverted,
 * and reported to the enclosing form, which refuses to save until it reads.
 */
export function ReadingInput({
  label,
  value,
  onChange,
  read,
  display,
  check,
  externalProblem,
  note,
  displayKey,
  id,
  disabled,
  placeholder,
}: ReadingInputProps) {
  const show = (next: number | undefined) => (next === undefined ? '' : display(next));
  const [text, setText] = useState(() => show(value));
  const [readAs, setReadAs] = useState<string | undefined>();
  const [problem, setProblem] = useState<string | undefined>();
  const hintId = useId();
  const noteId = useId();

  // Values shown another way (unit system, number format): the text follows, as React
  // recommends, by adjusting state while rendering rather than in an effect.
  const [shownAs, setShownAs] = useState(displayKey);
  // The value this field last reported. A different value arriving from outside (another
  // version taken after a conflict, a reset) replaces the text; the person's typing never does.
  const [reported, setReported] = useState(value);
  if (shownAs !== displayKey || value !== reported) {
    setShownAs(displayKey);
    setReported(value);
    setText(show(value));
    setReadAs(undefined);
    setProblem(undefined);
  }

  const report = (next: number | undefined) => {
    setReported(next);
    onChange(next);
  };

  const onText = (next: string) => {
    setText(next);
    if (next.trim() === '') {
      setProblem(undefined);
      setReadAs(undefined);
      report(undefined);
      return;
    }
    try {
      const reading = read(next);
      setReadAs(reading.readAs);
      setProblem(check?.(reading.value));
      report(reading.value);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      setProblem(`“${next.trim()}” ${error.reason}`);
      setReadAs(undefined);
      report(undefined);
    }
  };

  const unreadable = problem !== undefined && readAs === undefined;
  useReportUnreadable(unreadable ? { label, reason: problem } : undefined);
  const shownProblem = problem ?? externalProblem;
  const shownNote = shownProblem ? undefined : note;
  return (
    <>
      <Input
        id={id}
        aria-label={label}
        aria-describedby={shownNote ? `${hintId} ${noteId}` : hintId}
        aria-invalid={shownProblem ? true : undefined}
        status={shownProblem ? 'error' : shownNote ? 'warning' : undefined}
        value={text}
        disabled={disabled}
        placeholder={placeholder}
        onChange={(event) => onText(event.target.value)}
        className="lw-mono"
      />
      <Typography.Text
        id={hintId}
        type={shownProblem ? 'danger' : 'secondary'}
        style={{ fontSize: 12, display: 'block' }}
        aria-live="polite"
      >
        {shownProblem
          ? sentence(label, shownProblem)
          : readAs
            ? `read as ${readAs}`
            : value !== undefined
              ? `read as ${display(value)}`
              : ' '}
      </Typography.Text>
      {shownNote ? (
        // Ink, not the accent colour: the note must stay readable (the accent fails contrast).
        <Typography.Text
          id={noteId}
          strong
          style={{ fontSize: 12, display: 'block' }}
          data-note="check-this"
          aria-live="polite"
        >
          {shownNote}
        </Typography.Text>
      ) : null}
    </>
  );
}

/** "Diameter must be between …", "Diameter: “1,500” could be …". */
function sentence(label: string, problem: string): string {
  return /^(must|is|has|needs) /.test(problem) ? `${label} ${problem}` : `${label}: ${problem}`;
}
