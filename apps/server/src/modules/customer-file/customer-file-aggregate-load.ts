import type { EntityManager } from '@mikro-orm/sqlite';
import { ConflictError } from '../common/errors.js';
import { customerAggregate, type CustomerAggregate } from './customer-file-aggregate.js';
import { customerFileLoad, type CustomerFileScope } from './customer-file.service.js';
import { customerPointsLoad } from './customer-points.js';

/**
 * The aggregated view of an imported file's customers (bins of at least 11 customers only).
 * @param em - entity manager
 * @param scope - organization and workspace
 * @param fileId - the file
 * @param zoom - map zoom level
 * @returns the GeoJSON FeatureCollection
 * @throws ConflictError NOT_IMPORTED before a successful import
 * @example
 * const fc = await customerFileAggregate(em, scope, id, 12);
 */
export async function customerFileAggregate(
  em: EntityManager,
  scope: CustomerFileScope,
  fileId: string,
  zoom: number,
): Promise<CustomerAggregate> {
  const f = await customerFileLoad(em, scope, fileId);
  if (f.status !== 'imported')
    throw new ConflictError(
      'NOT_IMPORTED',
      `This file is ${f.status}; the customer map is available once it is imported.`,
    );
  return customerAggregate(await customerPointsLoad(em.fork(), f.id), zoom);
}
