// Money as whole minor units (pence, cents), never floating point. The minor-unit exponents are
// those of ISO 4217's list of currency codes (ISO 4217:2015, table A.1): 2 for each currency here
// except JPY, which has none.
export const CURRENCIES = {
  GBP: 2,
  EUR: 2,
  USD: 2,
  CAD: 2,
  AUD: 2,
  NZD: 2,
  CHF: 2,
  SEK: 2,
  NOK: 2,
  DKK: 2,
  JPY: 0,
} as const;
export type Currency = keyof typeof CURRENCIES;
export const CURRENCY_CODES = Object.keys(CURRENCIES) as [Currency, ...Currency[]];

export function isCurrency(code: string): code is Currency {
  return Object.hasOwn(CURRENCIES, code);
}

/** An amount typed in major units (e.g. 1500.5 GBP) as minor units (150050), or null if it has more decimals than the currency. */
export function toMinor(amount: number, currency: Currency): number | null {
  const factor = 10 ** CURRENCIES[currency];
  const minor = Math.round(amount * factor);
  return Math.abs(minor - amount * factor) < 1e-6 ? minor : null;
}

/** "£1,500.00", "¥20,000": a minor-unit amount for people to read. */
export function formatMoney(minor: number, currency: string, locale = "en-GB"): string {
  const exp = isCurrency(currency) ? CURRENCIES[currency] : 2;
  return new Intl.NumberFormat(locale, {
    style: "currency",
    currency,
    minimumFractionDigits: exp,
    maximumFractionDigits: exp,
  }).format(minor / 10 ** exp);
}
