import { randomUUID } from 'node:crypto';
import type { EntitySchema } from '@mikro-orm/core';

/** Fields every entity has: a random string id and creation/update times. */
export interface BaseEntity {
  id: string;
  createdAt: Date;
  updatedAt: Date;
}

/**
 * Property definitions shared by all entity schemas (random UUID ids make ids unguessable).
 * @returns the properties to spread into an EntitySchema definition
 * @example
 * new EntitySchema<User>({ name: 'User', properties: { ...baseProperties(), email: { type: 'string' } } });
 */
export function baseProperties() {
  return {
    id: { type: 'string', primary: true, length: 36, onCreate: () => randomUUID() },
    createdAt: { type: 'Date', onCreate: () => new Date() },
    updatedAt: { type: 'Date', onCreate: () => new Date(), onUpdate: () => new Date() },
  } satisfies ConstructorParameters<typeof EntitySchema>[0]['properties'];
}

/**
 * A new random entity id.
 * @returns a UUID v4 string
 * @example
 * const id = entityId();
 */
export function entityId(): string {
  return randomUUID();
}
