// The page's state: everything the modules share, declared here once.
import type { SpecField } from '../specFields.ts';
import type { FormValue } from '../formValues.ts';
import type { DerivedValue } from '../derivedValues.ts';
import type { View } from './api.ts';

export interface PageState {
  /** the form's fields, from /api/setup (the spec schema) */
  fields: readonly SpecField[];
  /** the form's values now, posted with every request */
  values: Record<string, FormValue>;
  /** the values as opened or last saved (a field that differs shows as changed) */
  initial: Record<string, FormValue>;
  /** the last views the server built (null until the first good spec) */
  build: View | null;
  /** fields whose default follows other fields: their current value and what they follow */
  derived: Readonly<Record<string, DerivedValue>>;
}

export const state: PageState = {
  fields: [],
  values: {},
  initial: {},
  build: null,
  derived: {},
};
