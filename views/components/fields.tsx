// Form fields that show the user's text back and the message beside the field.
import type { FC } from 'hono/jsx';

export interface FieldState {
  values: Record<string, string>;
  errors: Record<string, string>;
}

export const emptyState = (): FieldState => ({ values: {}, errors: {} });

export const Field: FC<{ name: string; label: string; state: FieldState; unit?: string; hint?: string; size?: number; type?: string; required?: boolean; id?: string }> = ({
  id: idIn,
  name,
  label,
  state,
  unit,
  hint,
  size,
  type,
  required,
}) => {
  const error = state.errors[name];
  const id = idIn ?? `f-${name}`;
  return (
    <label class={error ? 'field has-error' : 'field'} for={id}>
      <span class="label">
        {label}
        {unit ? <span class="unit"> ({unit})</span> : null}
      </span>
      <input id={id} name={name} type={type ?? 'text'} value={state.values[name] ?? ''} size={size ?? 10} aria-invalid={error ? 'true' : undefined} required={required} />
      {hint && !error ? <span class="hint">{hint}</span> : null}
      {error ? (
        <span class="error" role="alert">
          {error}
        </span>
      ) : null}
    </label>
  );
};

export const Select: FC<{ name: string; label: string; state: FieldState; options: [string, string][] }> = ({ name, label, state, options }) => {
  const error = state.errors[name];
  return (
    <label class={error ? 'field has-error' : 'field'} for={`f-${name}`}>
      <span class="label">{label}</span>
      <select id={`f-${name}`} name={name}>
        {options.map(([value, text]) => (
          <option value={value} selected={state.values[name] === value}>
            {text}
          </option>
        ))}
      </select>
      {error ? (
        <span class="error" role="alert">
          {error}
        </span>
      ) : null}
    </label>
  );
};

export const Check: FC<{ name: string; label: string; state: FieldState }> = ({ name, label, state }) => (
  <label class="field check" for={`f-${name}`}>
    <input id={`f-${name}`} type="checkbox" name={name} value="true" checked={state.values[name] === 'true'} />
    <span class="label">{label}</span>
  </label>
);

export const FormErrors: FC<{ state: FieldState }> = ({ state }) => {
  const general = state.errors._form;
  const count = Object.keys(state.errors).length;
  if (!count) return null;
  return (
    <div class="form-errors" role="alert">
      {general ? <p>{general}</p> : null}
      {count > (general ? 1 : 0) ? <p>Nothing was saved. Correct the marked fields and save again; what you typed is kept.</p> : null}
    </div>
  );
};

export const Badge: FC<{ severity: 'ok' | 'caution' | 'fail' }> = ({ severity }) => (
  <span class={`sev sev-${severity}`}>{severity === 'ok' ? 'OK' : severity === 'caution' ? 'Caution' : 'Fail'}</span>
);
