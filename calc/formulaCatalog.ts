/** Every formula definition exported by calc/ (for the formula reference page and its test). */
import * as calc from './index';
import { isFormulaDef, type FormulaDef } from './formula';

export const formulaCatalog: FormulaDef[] = Object.values(calc)
  .filter(isFormulaDef)
  .sort((a, b) => a.id.localeCompare(b.id));
