// Command-line flags of the bench scripts: `--name value` pairs and bare `--flag` switches.
export function parseArgs(argv, defaults) {
  const out = { ...defaults };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (!arg.startsWith('--')) throw new Error(`unexpected argument "${arg}"`);
    const name = arg.slice(2);
    if (!(name in defaults)) {
      throw new Error(`unknown option --${name} (known: ${Object.keys(defaults).join(', ')})`);
    }
    if (typeof defaults[name] === 'boolean') {
      out[name] = true;
      continue;
    }
    const value = argv[++i];
    if (value === undefined) throw new Error(`--${name} needs a value`);
    out[name] = typeof defaults[name] === 'number' ? Number(value) : value;
    if (typeof defaults[name] === 'number' && !(Number(value) > 0)) {
      throw new Error(`--${name} must be a positive number (got "${value}")`);
    }
  }
  return out;
}
