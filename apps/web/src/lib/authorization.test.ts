import { describe, expect, it } from 'vitest';
import { roleCan } from './authorization';

// Expected values are the rights table in PRODUCT.md ("Who uses it").
describe('roleCan', () => {
  it('lets only owners read the audit log', () => {
    expect(['owner', 'analyst', 'planner', 'executive'].filter((r) => roleCan(r as never, 'audit-log:read'))).toEqual(['owner']);
  });

  it('keeps executives from creating workspaces', () => {
    expect(roleCan('executive', 'workspace:create')).toBe(false);
    expect(roleCan('planner', 'workspace:create')).toBe(true);
  });

  it('lets owners and analysts delete workspaces, not planners', () => {
    expect(roleCan('analyst', 'workspace:delete')).toBe(true);
    expect(roleCan('planner', 'workspace:delete')).toBe(false);
  });

  it('shows aggregated customers to owners and analysts only ("see individual customer points")', () => {
    expect(['owner', 'analyst', 'planner', 'executive'].filter((r) => roleCan(r as never, 'customerPoints:read'))).toEqual(['owner', 'analyst']);
  });

  it('allows nothing without a role', () => {
    expect(roleCan(undefined, 'workspace:read')).toBe(false);
  });

  it('lets owners and analysts upload customer files and build surfaces, nobody else', () => {
    const roles = ['owner', 'analyst', 'planner', 'executive'] as const;
    expect(roles.filter((r) => roleCan(r, 'customerFile:write'))).toEqual(['owner', 'analyst']);
    expect(roles.filter((r) => roleCan(r, 'surface:write'))).toEqual(['owner', 'analyst']);
  });
});
