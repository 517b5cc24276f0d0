/** Labelled select with typed options. */
import { useId } from 'react';

export interface SelectFieldProps<T extends string> {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  testId?: string;
  title?: string;
}

export function SelectField<T extends string>({ label, value, options, onChange, testId, title }: SelectFieldProps<T>) {
  const id = useId();
  return (
    <div className="field" title={title}>
      <label htmlFor={id}>{label}</label>
      <select id={id} value={value} data-testid={testId} onChange={(e) => onChange(e.target.value as T)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>{o.label}</option>
        ))}
      </select>
    </div>
  );
}
