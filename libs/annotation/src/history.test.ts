import type { Shape } from './document';
import { commit, isDirty, markSaved, redo, startHistory, undo, upsert } from './history';

const ring = (id: string): Shape => ({ id, kind: 'ring', colour: 'amber', width: 'medium', centre: { x: 0.5, y: 0.5 }, rx: 0.1, ry: 0.1 });

describe('editor history', () => {
  it('undoes and redoes a drawn ring, and a new edit drops the redo branch', () => {
    let h = startHistory([]);
    h = commit(h, upsert(h.present, ring('a')));
    h = commit(h, upsert(h.present, ring('b')));
    h = undo(h);
    expect(h.present.map((s) => s.id)).toEqual(['a']);
    h = redo(h);
    expect(h.present.map((s) => s.id)).toEqual(['a', 'b']);
    h = undo(undo(h));
    expect(h.present).toEqual([]);
    h = commit(h, [ring('c')]);
    expect(redo(h).present.map((s) => s.id)).toEqual(['c']);
  });

  it('moves a shape in place rather than adding a copy', () => {
    const moved = { ...ring('a'), centre: { x: 0.2, y: 0.2 } };
    expect(upsert([ring('a'), ring('b')], moved)).toEqual([moved, ring('b')]);
  });
});

describe('saved point', () => {
  it('reads as saved again after undoing back to what was saved, and unsaved after redoing away', () => {
    let h = startHistory([ring('a')]);
    expect(isDirty(h)).toBe(false);
    h = commit(h, upsert(h.present, ring('b')));
    expect(isDirty(h)).toBe(true);
    h = undo(h);
    expect(isDirty(h)).toBe(false);
    h = redo(h);
    expect(isDirty(h)).toBe(true);
    h = markSaved(h, h.present);
    expect(isDirty(h)).toBe(false);
    h = undo(h);
    expect(isDirty(h)).toBe(true);
    h = redo(h);
    expect(isDirty(h)).toBe(false);
  });

  it('marks the list that was sent, not a later edit made while the save was on its way', () => {
    let h = startHistory([]);
    h = commit(h, [ring('a')]);
    const sent = h.present;
    h = commit(h, upsert(h.present, ring('b')));
    h = markSaved(h, sent);
    expect(isDirty(h)).toBe(true);
    h = undo(h);
    expect(isDirty(h)).toBe(false);
  });
});
