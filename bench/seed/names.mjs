// Invented names only: syllables and plain words combined, no real company or person.
const SUPPLIER_FIRST = [
  'Harlow',
  'Brindle',
  'Quillon',
  'Marrowby',
  'Tansey',
  'Oakum',
  'Fennick',
  'Corwen',
  'Dunmere',
  'Elbury',
  'Gallin',
  'Hestow',
  'Iverly',
  'Jessop Vale',
  'Kestrel Row',
  'Lindell',
  'Morrowgate',
  'Nettlefield',
  'Orrinby',
  'Pellam',
  'Ravelin',
  'Sallow',
  'Thornaby',
  'Umberly',
  'Varrow',
];
const SUPPLIER_SECOND = [
  'Wire Works',
  'Cable Supply',
  'Conductor Co.',
  'Harness Ltd',
  'Power Leads',
  'Wire & Spool',
  'Cable Traders',
  'Kitting',
  'Copper Goods',
  'Lead Makers',
];
const GIVEN = [
  'Ada',
  'Bram',
  'Celia',
  'Dario',
  'Edda',
  'Femi',
  'Greer',
  'Hollis',
  'Ines',
  'Joaquin',
  'Kaia',
  'Lorcan',
  'Mireille',
  'Nuno',
  'Odile',
  'Per',
  'Quinta',
  'Rafferty',
  'Saoirse',
  'Tobin',
];
const FAMILY = [
  'Abernath',
  'Brisco',
  'Calloway-Unn',
  'Dervish',
  'Eskerby',
  'Fallowmere',
  'Gretton',
  'Halvard',
  'Ibbotsley',
  'Jorvane',
  'Kettleby',
  'Lusk-Amari',
  'Mavrodin',
  'Norcott',
  'Oyelaran',
  'Prewitt',
];

/** The i-th supplier's name and code, unique for i below 250, numbered beyond. */
export function supplierName(i) {
  const first = SUPPLIER_FIRST[i % SUPPLIER_FIRST.length];
  const second = SUPPLIER_SECOND[Math.floor(i / SUPPLIER_FIRST.length) % SUPPLIER_SECOND.length];
  const round = Math.floor(i / (SUPPLIER_FIRST.length * SUPPLIER_SECOND.length));
  const name = `${first} ${second}${round ? ` ${round + 1}` : ''}`;
  const code = `${first
    .replace(/[^A-Za-z]/g, '')
    .slice(0, 4)
    .toUpperCase()}${String(i + 1).padStart(3, '0')}`;
  return { name, code };
}

export function personName(i) {
  return `${GIVEN[i % GIVEN.length]} ${FAMILY[Math.floor(i / GIVEN.length) % FAMILY.length]}`;
}
