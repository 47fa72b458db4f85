export { stripeFakeStart, type StripeFake, type StripeFakeOptions } from './stripe-fake.js';
export { TEST_CARDS } from './checkout-page.js';
export type { DeliveryAttempt } from './webhook-delivery.js';
export type { WireObject } from './fake-objects.js';
