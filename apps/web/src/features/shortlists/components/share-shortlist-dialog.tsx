import { Alert, Button, Dialog, TextAreaField } from '@demandscape/ui';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { dateTimeText } from '../../../lib/format';
import { useShareShortlist } from '../api/share-shortlist';
import type { Shortlist, ShortlistRecipient } from '../types';

export type ShareShortlistDialogProps = {
  orgId: string;
  shortlist: Pick<Shortlist, 'id' | 'workspaceId' | 'name' | 'sharedWith'>;
  open: boolean;
  onClose: () => void;
};

function RecipientList({ recipients, label }: { recipients: ShortlistRecipient[]; label: string }) {
  return (
    <ul aria-label={label} className="flex flex-col gap-1 text-sm">
      {recipients.map((r) => (
        <li key={`${r.userId}-${r.sharedAt}`} className="flex flex-wrap justify-between gap-2">
          <span className="text-ink">
            {r.name} <span className="text-ink-muted">({r.email})</span>
          </span>
          <span className="text-xs text-ink-faint">{dateTimeText(r.sharedAt)}</span>
        </li>
      ))}
    </ul>
  );
}

/** "Sent to 2 people": those whose share time is this send's (the list also holds earlier shares). */
function sentTitle(recipients: ShortlistRecipient[]): string {
  const latest = recipients.reduce((max, r) => (r.sharedAt > max ? r.sharedAt : max), '');
  const now = recipients.filter((r) => r.sharedAt === latest).length;
  return `Sent to ${now} ${now === 1 ? 'person' : 'people'}`;
}

/**
 * "Share with executives": an optional message, then every executive of the organization gets an e-mail
 * with a link to the shortlist's page. Shows who received it and when, or the server's reason it could not be sent.
 * @param props the organization, the shortlist, and the dialog's open state
 * @returns the dialog
 * @example <ShareShortlistDialog orgId={orgId} shortlist={s} open={open} onClose={close} />
 */
export function ShareShortlistDialog({ orgId, shortlist, open, onClose }: ShareShortlistDialogProps) {
  const [message, setMessage] = useState('');
  const share = useShareShortlist(orgId, shortlist.workspaceId, shortlist.id);
  const close = () => {
    share.reset();
    setMessage('');
    onClose();
  };

  return (
    <Dialog
      open={open}
      onClose={close}
      title="Share with executives"
      description={`Every executive of the organization gets an e-mail with a link to the read-only page of “${shortlist.name}”.`}
    >
      {share.isSuccess ? (
        <div className="flex flex-col gap-3">
          <Alert tone="success" title={sentTitle(share.data.sharedWith)}>
            <RecipientList recipients={share.data.sharedWith} label="Sent to" />
          </Alert>
          {share.data.failed?.length ? (
            <Alert tone="caution" title="Not every e-mail went out">
              No e-mail reached {share.data.failed.map((f) => f.name).join(', ')}. Share again later to retry.
            </Alert>
          ) : null}
          <Button className="self-end" onClick={close}>
            Done
          </Button>
        </div>
      ) : (
        <form
          noValidate
          className="flex flex-col gap-4"
          onSubmit={(e) => {
            e.preventDefault();
            const text = message.trim();
            share.mutate(text ? { message: text } : {});
          }}
        >
          <TextAreaField
            label="Message (optional)"
            hint="Added to the e-mail above the link, e.g. what you want decided and by when."
            rows={3}
            maxLength={2000}
            value={message}
            onChange={(e) => setMessage(e.target.value)}
          />
          {share.isError ? (
            <Alert tone="danger" title="Not shared">
              {errorMessage(share.error)}
            </Alert>
          ) : null}
          {shortlist.sharedWith.length > 0 ? (
            <section className="flex flex-col gap-1">
              <h3 className="text-xs font-semibold text-ink-muted">Shared before</h3>
              <RecipientList recipients={shortlist.sharedWith} label="Shared before" />
            </section>
          ) : null}
          <div className="flex justify-end gap-2">
            <Button variant="ghost" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" isLoading={share.isPending}>
              Send to executives
            </Button>
          </div>
        </form>
      )}
    </Dialog>
  );
}
