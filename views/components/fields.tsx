// Form fields that show the user's text back and the message beside the field.
import type { FC } from 'hono/jsx';

export interface FieldState {
  values: Record<string, string>;
  errors: Record<string, string>;
}

export const emptyState = (): FieldState => ({ values: {}, errors: {} });

interface Common {
  name: string;
  label: string;
  state: FieldState;
  /** id prefix: pages with many forms repeat field names, and each label must point at its own input */
  idp?: string;
  /** the input's id, when the caller derives it (SpecField: field-id.ts); else idp + name */
  id?: string;
  cls?: string;
  hint?: string;
}

const Message: FC<{ error?: string; hint?: string }> = ({ error, hint }) =>
  error ? (
    <span class="error" role="alert">
      {error}
    </span>
  ) : hint ? (
    <span class="hint">{hint}</span>
  ) : null;

const fieldClass = (error: string | undefined, cls?: string) =>
  `field${error ? ' has-error' : ''}${cls ? ' ' + cls : ''}`;

export const Field: FC<Common & { unit?: string; size?: number; type?: string; required?: boolean; list?: string }> = ({
  name,
  label,
  state,
  idp,
  cls,
  hint,
  unit,
  size,
  type,
  required,
  id: idIn,
  list,
}) => {
  const error = state.errors[name];
  const id = idIn ?? `${idp ?? 'f'}-${name}`;
  return (
    <label class={fieldClass(error, cls)} for={id}>
      <span class="label">
        {label}
        {unit ? <span class="unit"> ({unit})</span> : null}
      </span>
      <input
        id={id}
        name={name}
        type={type ?? 'text'}
        value={state.values[name] ?? ''}
        size={size ?? 10}
        aria-invalid={error ? 'true' : undefined}
        required={required}
        list={list}
      />
      <Message error={error} hint={hint} />
    </label>
  );
};

export const Select: FC<Common & { options: [string, string][] }> = ({
  name,
  label,
  state,
  idp,
  id: idIn,
  cls,
  hint,
  options,
}) => {
  const error = state.errors[name];
  const id = idIn ?? `${idp ?? 'f'}-${name}`;
  const value = state.values[name];
  const known = options.some(([v]) => v === value);
  return (
    <label class={fieldClass(error, cls)} for={id}>
      <span class="label">{label}</span>
      <select id={id} name={name} aria-invalid={error ? 'true' : undefined}>
        {!known && value ? (
          <option value={value} selected>
            (missing: {value})
          </option>
        ) : null}
        {options.map(([v, text]) => (
          <option value={v} selected={value === v}>
            {text}
          </option>
        ))}
      </select>
      <Message error={error} hint={hint} />
    </label>
  );
};

export const TextArea: FC<Common & { rows?: number; cols?: number }> = ({
  name,
  label,
  state,
  idp,
  id: idIn,
  cls,
  hint,
  rows,
  cols,
}) => {
  const error = state.errors[name];
  const id = idIn ?? `${idp ?? 'f'}-${name}`;
  return (
    <label class={fieldClass(error, cls)} for={id}>
      <span class="label">{label}</span>
      <textarea id={id} name={name} rows={rows ?? 3} cols={cols ?? 40} aria-invalid={error ? 'true' : undefined}>
        {state.values[name] ?? ''}
      </textarea>
      <Message error={error} hint={hint} />
    </label>
  );
};

export const Check: FC<{ name: string; label: string; state: FieldState; idp?: string; id?: string }> = ({
  name,
  label,
  state,
  idp,
  id,
}) => (
  <label class="field check" for={id ?? `${idp ?? 'f'}-${name}`}>
    <input
      id={id ?? `${idp ?? 'f'}-${name}`}
      type="checkbox"
      name={name}
      value="true"
      checked={state.values[name] === 'true'}
    />
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
      {count > (general ? 1 : 0) ? (
        <p>Nothing was saved. Correct the marked fields and save again; what you typed is kept.</p>
      ) : null}
    </div>
  );
};

export const Badge: FC<{ severity: 'ok' | 'caution' | 'fail' }> = ({ severity }) => (
  <span class={`sev sev-${severity}`}>{severity === 'ok' ? 'OK' : severity === 'caution' ? 'Caution' : 'Fail'}</span>
);
