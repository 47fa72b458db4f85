import { dateTimeText } from '../../../lib/format';
import type { Shortlist } from '../types';

export type ShortlistVersionLineProps = { shortlist: Pick<Shortlist, 'version' | 'latestVersion'> };

/**
 * Which version is shown, when and by whom it was saved, its note, and the run and surface its scores come from.
 * @param props the shortlist at the version shown
 * @returns a short paragraph
 * @example <ShortlistVersionLine shortlist={s} />
 */
export function ShortlistVersionLine({ shortlist }: ShortlistVersionLineProps) {
  const v = shortlist.version;
  return (
    <div className="text-sm text-ink-muted">
      <p>
        <span className="font-medium text-ink">
          Version {v.version} of {shortlist.latestVersion}
        </span>{' '}
        · saved {dateTimeText(v.createdAt)}
        {v.createdBy ? ` by ${v.createdBy.name}` : ''}
      </p>
      {v.versionNote ? <p className="mt-0.5 italic">“{v.versionNote}”</p> : null}
      <p className="mt-0.5 text-xs">
        Scores from the run “{v.scoringRunName}” on the demand surface “{v.surfaceName}”.
      </p>
    </div>
  );
}
