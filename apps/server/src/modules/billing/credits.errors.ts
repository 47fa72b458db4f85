import { AppError, type ErrorBody } from '../common/errors.js';

/** 402: the organization's credit balance does not cover a run; `details` = { balance, cost }. */
export class InsufficientCreditsError extends AppError {
  readonly balance: number;
  readonly cost: number;

  constructor(balance: number, cost: number) {
    super(402, 'INSUFFICIENT_CREDITS', `This run costs ${cost} credits; the balance is ${balance} — buy credits or use a larger cell size`);
    this.balance = balance;
    this.cost = cost;
  }

  /** @returns the error body with `details: { balance, cost }` */
  override toBody(): ErrorBody & { details: { balance: number; cost: number } } {
    return { ...super.toBody(), details: { balance: this.balance, cost: this.cost } };
  }
}
