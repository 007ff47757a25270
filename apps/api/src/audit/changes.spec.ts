import { applyChanges } from './changes';

describe('applyChanges', () => {
  it('applies only what differs and reports it as from/to', () => {
    const target = {
      title: 'Old',
      year: 1998,
      seenAt: new Date('2026-01-01T00:00:00Z'),
      note: 'x',
    };
    const changes = applyChanges(target, {
      title: 'New',
      year: 1998,
      seenAt: new Date('2026-01-02T00:00:00Z'),
      note: undefined,
    });
    expect(changes).toEqual({
      title: { from: 'Old', to: 'New' },
      seenAt: { from: '2026-01-01T00:00:00.000Z', to: '2026-01-02T00:00:00.000Z' },
    });
    expect(target).toMatchObject({ title: 'New', year: 1998, note: 'x' });
  });

  it('treats equal dates as unchanged and null as a value', () => {
    const target = { at: new Date('2026-01-01T00:00:00Z'), capture: 'a' as string | null };
    expect(applyChanges(target, { at: new Date('2026-01-01T00:00:00Z') })).toEqual({});
    expect(applyChanges(target, { capture: null })).toEqual({ capture: { from: 'a', to: null } });
  });
});
