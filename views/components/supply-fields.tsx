// Field and Select as in fields.tsx, with an id prefix: the supply, parts and parts-list pages repeat the
// same field names in many forms, and label `for` must point at the input of its own form.
// (Same markup and classes as fields.tsx; only the id differs. Candidate for an `idPrefix` prop there.)
import type { FC } from 'hono/jsx';
import type { FieldState } from './fields';

type FieldProps = { name: string; label: string; state: FieldState; idp: string; unit?: string; hint?: string; size?: number; type?: string; cls?: string; list?: string };

export const PField: FC<FieldProps> = ({ name, label, state, idp, unit, hint, size, type, cls, list }) => {
  const error = state.errors[name];
  const id = `${idp}-${name}`;
  return (
    <label class={`field${error ? ' has-error' : ''}${cls ? ' ' + cls : ''}`} for={id}>
      <span class="label">
        {label}
        {unit ? <span class="unit"> ({unit})</span> : null}
      </span>
      <input id={id} name={name} type={type ?? 'text'} value={state.values[name] ?? ''} size={size ?? 10} aria-invalid={error ? 'true' : undefined} list={list} />
      {hint && !error ? <span class="hint">{hint}</span> : null}
      {error ? (
        <span class="error" role="alert">
          {error}
        </span>
      ) : null}
    </label>
  );
};

export const PSelect: FC<{ name: string; label: string; state: FieldState; idp: string; options: [string, string][]; cls?: string; hint?: string }> = ({ name, label, state, idp, options, cls, hint }) => {
  const error = state.errors[name];
  const id = `${idp}-${name}`;
  const known = options.some(([v]) => v === state.values[name]);
  return (
    <label class={`field${error ? ' has-error' : ''}${cls ? ' ' + cls : ''}`} for={id}>
      <span class="label">{label}</span>
      <select id={id} name={name} aria-invalid={error ? 'true' : undefined}>
        {!known && state.values[name] ? (
          <option value={state.values[name]} selected>
            (missing: {state.values[name]})
          </option>
        ) : null}
        {options.map(([value, text]) => (
          <option value={value} selected={state.values[name] === value}>
            {text}
          </option>
        ))}
      </select>
      {hint && !error ? <span class="hint">{hint}</span> : null}
      {error ? (
        <span class="error" role="alert">
          {error}
        </span>
      ) : null}
    </label>
  );
};

export const PText: FC<{ name: string; label: string; state: FieldState; idp: string; rows?: number; cols?: number; hint?: string }> = ({ name, label, state, idp, rows, cols, hint }) => {
  const error = state.errors[name];
  const id = `${idp}-${name}`;
  return (
    <label class={`field${error ? ' has-error' : ''}`} for={id}>
      <span class="label">{label}</span>
      <textarea id={id} name={name} rows={rows ?? 3} cols={cols ?? 40} aria-invalid={error ? 'true' : undefined}>
        {state.values[name] ?? ''}
      </textarea>
      {hint && !error ? <span class="hint">{hint}</span> : null}
      {error ? (
        <span class="error" role="alert">
          {error}
        </span>
      ) : null}
    </label>
  );
};
