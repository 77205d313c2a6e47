// The benchmark's output: one line per figure, then one per budget.
export class Report {
  constructor() {
    this.figures = [];
    this.budgets = [];
    this.missing = [];
  }

  /** `name: value unit`; a value that is not a finite number marks a broken code path. */
  figure(name, value, unit, digits = 1) {
    const ok = typeof value === 'number' && Number.isFinite(value);
    if (!ok) this.missing.push(name);
    const text = ok ? value.toFixed(digits) : 'not measured';
    this.figures.push(`${name}: ${text} ${unit}`);
    console.log(`${name}: ${text} ${unit}`);
    return value;
  }

  /** `budget NAME: PASS|FAIL (detail)`; checks is a list of [pass, text]. */
  budget(name, checks) {
    const pass = checks.every(([ok]) => ok === true);
    this.budgets.push(
      `budget ${name}: ${pass ? 'PASS' : 'FAIL'} (${checks.map(([, t]) => t).join('; ')})`,
    );
  }

  printBudgets() {
    for (const line of this.budgets) console.log(line);
  }
}

export const fmt = (v, digits = 1) => (Number.isFinite(v) ? v.toFixed(digits) : 'n/a');
