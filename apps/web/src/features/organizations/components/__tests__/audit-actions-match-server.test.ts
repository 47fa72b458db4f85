import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { auditActions } from '../../api/get-audit-events';
import { auditActionLabel } from '../audit-action-label';

// The server's list is the source of truth (apps/server/src/modules/audit/audit-event.entity.ts);
// read as text so the web package does not import server code.
const serverEntity = join(dirname(fileURLToPath(import.meta.url)), '../../../../../../server/src/modules/audit/audit-event.entity.ts');

function serverAuditActions(): string[] {
  const source = readFileSync(serverEntity, 'utf8');
  const list = /AUDIT_ACTIONS\s*=\s*\[([\s\S]*?)\]/.exec(source);
  if (!list) throw new Error(`AUDIT_ACTIONS not found in ${serverEntity}`);
  return [...list[1]!.matchAll(/'([a-z_.]+)'/g)].map((m) => m[1]!);
}

describe('audit actions in the audit log', () => {
  it('offers every action the server records in the filter, and nothing else', () => {
    const server = serverAuditActions();
    expect(server.length).toBeGreaterThan(30);
    expect([...auditActions].sort()).toEqual([...server].sort());
  });

  it('words every action plainly instead of showing its code', () => {
    const unlabelled = serverAuditActions().filter((a) => auditActionLabel(a) === a);
    expect(unlabelled).toEqual([]);
  });
});
