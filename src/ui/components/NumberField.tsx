/**
 * Labelled number input that commits on Enter or leaving the field (not on every keystroke, so
 * the analysis re-runs once per edit). Out-of-range or non-numeric text is refused with a note.
 */
import { useEffect, useId, useState } from 'react';

export interface NumberFieldProps {
  label: string;
  unit?: string;
  value: number | null;
  onCommit: (value: number | null) => void;
  min?: number;
  max?: number;
  step?: number;
  /** Empty input means "none" (null) instead of an error. */
  allowEmpty?: boolean;
  testId?: string;
  title?: string;
  placeholder?: string;
}

export function NumberField({ label, unit, value, onCommit, min = -Infinity, max = Infinity, step, allowEmpty, testId, title, placeholder }: NumberFieldProps) {
  const id = useId();
  const [text, setText] = useState(value === null ? '' : String(value));
  const [problem, setProblem] = useState<string | null>(null);
  useEffect(() => setText(value === null ? '' : String(value)), [value]);

  const commit = () => {
    const t = text.trim().replace(',', '.');
    if (t === '' && allowEmpty) {
      setProblem(null);
      if (value !== null) onCommit(null);
      return;
    }
    const v = Number(t);
    if (t === '' || !Number.isFinite(v) || v < min || v > max) {
      setProblem(`${label}: enter a number${Number.isFinite(min) ? ` ≥ ${min}` : ''}${Number.isFinite(max) ? ` and ≤ ${max}` : ''}`);
      return;
    }
    setProblem(null);
    if (v !== value) onCommit(v);
  };

  return (
    <div className="field" title={title}>
      <label htmlFor={id}>{label}{unit ? <span className="unit"> ({unit})</span> : null}</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        step={step}
        placeholder={placeholder}
        aria-invalid={problem !== null}
        data-testid={testId}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
        }}
      />
      {problem ? <span className="field-problem" role="alert">{problem}</span> : null}
    </div>
  );
}
