// A refused submission travels back into the partial so its form shows what the user typed and why.
import type { FieldState } from './fields';

export interface Failed {
  form: string; // which form on the page was refused
  state: FieldState;
}

/** The state for form `key`: the refused submission if it is this form, else the stored values. */
export function stateFor(key: string, failed: Failed | undefined, stored: () => Record<string, string>): FieldState {
  if (failed && failed.form === key) return failed.state;
  return { values: stored(), errors: {} };
}
