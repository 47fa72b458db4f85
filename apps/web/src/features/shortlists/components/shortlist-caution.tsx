import { Alert } from '@demandscape/ui';

export type ShortlistCautionProps = { caution: string };

/**
 * The caution that goes with every shortlist, as the server words it: the surface is an estimate from a
 * sample; leases, zoning and local rules need licensed review.
 * @param props the caution text from the API
 * @returns a visible callout
 * @example <ShortlistCaution caution={shortlist.caution} />
 */
export function ShortlistCaution({ caution }: ShortlistCautionProps) {
  return (
    <Alert tone="caution" title="Before anyone signs a lease">
      {caution}
    </Alert>
  );
}
