/** An amount with its ISO 4217 code, e.g. "EUR 1,234.50". */
export function money(amount: number, currency: string): string {
  return `${currency} ${amount.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
}
