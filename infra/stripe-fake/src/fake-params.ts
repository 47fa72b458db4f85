import { FakeApiError, fakeId, type FakeLineItem } from './fake-objects.js';

/** A form body as parsed from bracket notation (`a[b][0][c]=1` → nested objects/arrays of strings). */
export type FormValue = string | FormValue[] | { [key: string]: FormValue };

/**
 * Reads a string parameter.
 * @param body - parsed form body
 * @param name - parameter name
 * @param required - throw when missing
 * @returns the value or undefined
 * @example
 * const email = paramString(body, 'email', false);
 */
export function paramString(body: Record<string, FormValue>, name: string, required: boolean): string | undefined {
  const value = body[name];
  if (value === undefined || value === '') {
    if (required) throw new FakeApiError(400, `Missing required param: ${name}.`, { param: name, code: 'parameter_missing' });
    return undefined;
  }
  if (typeof value !== 'string') throw new FakeApiError(400, `Invalid string: ${name} must be a string.`, { param: name });
  return value;
}

/**
 * Reads a whole-number parameter (form values arrive as strings).
 * @param value - raw value
 * @param param - wire name for the error, e.g. `line_items[0][quantity]`
 * @param min - smallest allowed value
 * @returns the integer
 * @example
 * const quantity = paramInteger(item.quantity, 'line_items[0][quantity]', 1);
 */
export function paramInteger(value: FormValue | undefined, param: string, min: number): number {
  if (value === undefined || value === '') throw new FakeApiError(400, `Missing required param: ${param}.`, { param, code: 'parameter_missing' });
  const n = typeof value === 'string' && /^-?\d+$/.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(n)) throw new FakeApiError(400, `Invalid integer: ${param} must be a whole number (got ${JSON.stringify(value)}).`, { param });
  if (n < min) throw new FakeApiError(400, `Invalid integer: ${param} must be at least ${min} (got ${n}).`, { param });
  return n;
}

/**
 * Reads `metadata[key]=value` pairs (string values only, as the provider stores them).
 * @param value - raw `metadata` value
 * @param param - wire name for errors
 * @returns a string map
 * @example
 * const metadata = paramMetadata(body.metadata, 'metadata');
 */
export function paramMetadata(value: FormValue | undefined, param: string): Record<string, string> {
  if (value === undefined || value === '') return {};
  if (typeof value !== 'object' || Array.isArray(value)) throw new FakeApiError(400, `Invalid object: ${param} must be a map of strings.`, { param });
  const out: Record<string, string> = {};
  for (const [key, v] of Object.entries(value)) {
    if (typeof v !== 'string') throw new FakeApiError(400, `Invalid string: ${param}[${key}] must be a string.`, { param: `${param}[${key}]` });
    out[key] = v;
  }
  return out;
}

function listOf(value: FormValue | undefined): FormValue[] {
  if (value === undefined) return [];
  if (Array.isArray(value)) return value;
  if (typeof value === 'object') return Object.keys(value).sort((a, b) => Number(a) - Number(b)).map((k) => value[k]);
  return [value];
}

/**
 * Validates `line_items[i][price_data][…]` and `[quantity]` of a checkout session.
 * Only inline prices (`price_data`) exist in the fake; a `price` id is reported as unknown.
 * @param value - raw `line_items`
 * @param mode - 'payment' (one-off prices) or 'subscription' (recurring prices)
 * @returns validated lines
 * @example
 * const lines = lineItemsParse(body.line_items, 'payment');
 */
export function lineItemsParse(value: FormValue | undefined, mode: string): FakeLineItem[] {
  const items = listOf(value);
  if (items.length === 0) throw new FakeApiError(400, 'Missing required param: line_items.', { param: 'line_items', code: 'parameter_missing' });
  return items.map((raw, i) => {
    const at = `line_items[${i}]`;
    if (typeof raw !== 'object' || Array.isArray(raw)) throw new FakeApiError(400, `Invalid object: ${at}.`, { param: at });
    const priceId = raw.price;
    if (typeof priceId === 'string') throw new FakeApiError(400, `No such price: '${priceId}'`, { param: `${at}[price]`, code: 'resource_missing' });
    const pd = raw.price_data;
    if (typeof pd !== 'object' || Array.isArray(pd)) {
      throw new FakeApiError(400, `You must specify either \`price\` or \`price_data\` in ${at}.`, { param: `${at}[price_data]`, code: 'parameter_missing' });
    }
    const currency = typeof pd.currency === 'string' ? pd.currency.toLowerCase() : '';
    if (!/^[a-z]{3}$/.test(currency)) throw new FakeApiError(400, `Invalid currency: ${at}[price_data][currency] must be a three-letter code.`, { param: `${at}[price_data][currency]` });
    const product = pd.product_data;
    const name = typeof product === 'object' && !Array.isArray(product) && typeof product.name === 'string' ? product.name : '';
    if (!name) throw new FakeApiError(400, `Missing required param: ${at}[price_data][product_data][name].`, { param: `${at}[price_data][product_data][name]`, code: 'parameter_missing' });
    const recurring = pd.recurring;
    const interval = typeof recurring === 'object' && !Array.isArray(recurring) && typeof recurring.interval === 'string' ? recurring.interval : null;
    if (mode === 'subscription' && !interval) {
      throw new FakeApiError(400, `${at}[price_data][recurring] is required in subscription mode.`, { param: `${at}[price_data][recurring]` });
    }
    if (mode === 'payment' && interval) {
      throw new FakeApiError(400, `You specified \`payment\` mode but passed a recurring price in ${at}. Use \`subscription\` mode instead.`, { param: `${at}[price_data][recurring]` });
    }
    return {
      name,
      currency,
      unitAmount: paramInteger(pd.unit_amount, `${at}[price_data][unit_amount]`, 0),
      quantity: paramInteger(raw.quantity, `${at}[quantity]`, 1),
      interval,
      priceId: fakeId('price'),
    };
  });
}
