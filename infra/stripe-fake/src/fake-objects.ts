import { randomBytes } from 'node:crypto';

/** Plain JSON object as the provider sends it (snake_case keys, unix-second times). */
export type WireObject = Record<string, unknown>;

/** A line of a checkout session after validation (amounts in the currency's minor unit). */
export interface FakeLineItem {
  name: string;
  currency: string;
  unitAmount: number;
  quantity: number;
  /** Billing interval of a recurring price (subscriptions); null for one-off payments. */
  interval: string | null;
  priceId: string;
}

/** Everything the fake remembers; lost when it stops (it is a test stand-in, not a ledger). */
export interface FakeState {
  customers: Map<string, WireObject>;
  sessions: Map<string, WireObject>;
  sessionLines: Map<string, FakeLineItem[]>;
  subscriptions: Map<string, WireObject>;
  invoices: Map<string, WireObject>;
  events: WireObject[];
  /** Subscriptions whose card now fails (set through the failure control route). */
  failingSubscriptions: Set<string>;
}

/**
 * An empty state.
 * @returns maps for every object kind
 * @example
 * const state = fakeStateCreate();
 */
export function fakeStateCreate(): FakeState {
  return {
    customers: new Map(),
    sessions: new Map(),
    sessionLines: new Map(),
    subscriptions: new Map(),
    invoices: new Map(),
    events: [],
    failingSubscriptions: new Set(),
  };
}

/**
 * A new object id with the provider's prefix convention (`cus_`, `cs_test_`, `sub_`, `in_`, `evt_` …).
 * @param prefix - e.g. 'cus'
 * @returns e.g. `cus_3fA9…` (24 random base62-ish characters)
 * @example
 * fakeId('evt'); // 'evt_Zk3…'
 */
export function fakeId(prefix: string): string {
  const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';
  const bytes = randomBytes(24);
  let out = '';
  for (const b of bytes) out += alphabet[b % alphabet.length];
  return `${prefix}_${out}`;
}

/**
 * The current time in unix seconds, the unit of every timestamp on the wire.
 * @returns seconds since 1970
 * @example
 * const created = unixNow();
 */
export function unixNow(): number {
  return Math.floor(Date.now() / 1000);
}

/** An error in the provider's wire shape: `{ error: { type, message, param?, code? } }`. */
export class FakeApiError extends Error {
  readonly status: number;
  readonly type: string;
  readonly param?: string;
  readonly code?: string;

  constructor(status: number, message: string, options: { type?: string; param?: string; code?: string } = {}) {
    super(message);
    this.status = status;
    this.type = options.type ?? 'invalid_request_error';
    this.param = options.param;
    this.code = options.code;
  }

  /** @returns the JSON error body */
  toWire(): WireObject {
    return { error: { type: this.type, message: this.message, ...(this.param ? { param: this.param } : {}), ...(this.code ? { code: this.code } : {}) } };
  }
}

/**
 * 404 for an unknown object id, worded like the provider's `resource_missing` errors.
 * @param kind - e.g. 'customer'
 * @param id - the id asked for
 * @returns the error to throw
 * @example
 * throw missingObject('customer', 'cus_x');
 */
export function missingObject(kind: string, id: string): FakeApiError {
  return new FakeApiError(404, `No such ${kind}: '${id}'`, { param: 'id', code: 'resource_missing' });
}
