import type { ReactNode } from 'react';

export type PageHeaderProps = { title: ReactNode; description?: ReactNode; actions?: ReactNode };

/**
 * The heading row of a signed-in page.
 * @param props title, one-line description and actions on the right
 * @returns the header
 * @example <PageHeader title="Workspaces" actions={<Button>New workspace</Button>} />
 */
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
        {description ? <p className="mt-1 text-sm text-ink-muted">{description}</p> : null}
      </div>
      {actions ? <div className="flex items-center gap-2">{actions}</div> : null}
    </div>
  );
}
