import type { SelectOption } from '@/components/select';

const listOf = (kind: 'currency' | 'timeZone'): string[] => {
  try {
    return Intl.supportedValuesOf(kind);
  } catch {
    return [];
  }
};

/** ISO 4217 currencies this browser knows, "GBP · British pound", with the current one always present. */
export function currencyOptions(current: string): SelectOption[] {
  const names = new Intl.DisplayNames(['en-GB'], { type: 'currency' });
  const codes = new Set([...listOf('currency'), current]);
  return [...codes].sort().map((code) => ({ value: code, label: `${code} · ${names.of(code) ?? code}` }));
}

/** IANA time zones this browser knows ("Europe/London"), with the current one always present. */
export function timeZoneOptions(current: string): SelectOption[] {
  const zones = new Set([...listOf('timeZone'), current]);
  return [...zones].sort().map((zone) => ({ value: zone, label: zone.replaceAll('_', ' ') }));
}
