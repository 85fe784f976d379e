// A form field drawn from its spec: label, the display unit beside the box, the help line and the message.
import type { FC } from 'hono/jsx';
import type { Spec } from '../../src/core/spec/field';
import { formName } from '../../src/core/spec/field';
import { Field, Select, Check, TextArea, type FieldState } from './fields';
import { fieldId, PROJECT_ITEM } from './field-id';

interface Props {
  spec: Spec;
  /** model key of the field in the spec */
  k: string;
  state: FieldState;
  size?: number;
  /** id prefix of the form; also the item the field edits in its id (field-id.ts) unless `item` is given */
  idp?: string;
  /** the item in the input's id when it differs from idp (field-id.ts) */
  item?: string;
  /** options for a reference field (rails, stages), as [id, name] */
  options?: [string, string][];
  /** the first option of an optional reference ('(not on a rail here)') */
  none?: string;
  label?: string;
  hint?: string;
  /** the form field name when one spec is drawn several times (rows of a table) */
  name?: string;
  /** the unit shown beside the box when it depends on the project (a currency) */
  unit?: string;
  /** id of a datalist offering known values (supplier names, categories) */
  list?: string;
  cls?: string;
  /** rows of a multi-line text box */
  rows?: number;
}

export const SpecField: FC<Props> = ({
  spec,
  k,
  state,
  size,
  idp,
  item,
  options,
  none,
  label,
  hint,
  name: nameIn,
  unit: unitIn,
  list,
  cls,
  rows,
}) => {
  const f = spec.fields[k];
  if (!f) throw new Error(`no field ${k} in spec ${spec.name}`);
  const name = nameIn ?? formName(k, f);
  // a row of a table (nameIn) is told apart by its form name, a single field by its key
  const id = fieldId(spec.name, item ?? idp ?? PROJECT_ITEM, nameIn ?? k);
  const text = label ?? f.label;
  const help = hint ?? f.help;
  if (f.type === 'choice')
    return (
      <Select
        id={id}
        name={name}
        label={text}
        state={state}
        hint={help}
        options={f.options.map(([v, t]) => [v, t])}
        cls={cls}
      />
    );
  if (f.type === 'bool') return <Check id={id} name={name} label={text} state={state} />;
  if (f.type === 'ref') {
    const list = options ?? [];
    return (
      <Select
        id={id}
        name={name}
        label={text}
        state={state}
        hint={help}
        options={f.optional ? [['', none ?? '(none)'], ...list] : list}
        cls={cls}
      />
    );
  }
  if (f.type === 'text' && f.multiline && rows)
    return <TextArea id={id} name={name} label={text} state={state} hint={help} rows={rows} cols={size} cls={cls} />;
  const unit = unitIn ?? (f.type === 'number' ? f.display.symbol : undefined);
  return (
    <Field
      id={id}
      name={name}
      label={text}
      unit={unit || undefined}
      state={state}
      hint={help}
      size={size ?? (f.type === 'text' ? 30 : 7)}
      list={list}
      cls={cls}
    />
  );
};
