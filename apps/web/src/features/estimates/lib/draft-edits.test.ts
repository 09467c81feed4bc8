import { describe, expect, it } from 'vitest';
import { addChoice, addOption, previewKeys, removeOption, renameChoice } from './draft-edits';
import type { EstimateDraft } from './estimate-draft';

const empty: EstimateDraft = { title: '', notes: '', options: [], lines: [] };

describe('draft edits', () => {
  it('when choices are added, then each gets two options and a title of its own', () => {
    const twice = addChoice(addChoice(empty));
    expect(twice.options.map((o) => o.choice)).toEqual(['Choice 1', 'Choice 1', 'Choice 2', 'Choice 2']);
  });

  it('when a choice is renamed, then every option answering it follows', () => {
    const renamed = renameChoice(addOption(addChoice(empty), 'Choice 1'), 'choice 1', 'Case');
    expect(renamed.options.map((o) => o.choice)).toEqual(['Case', 'Case', 'Case']);
  });

  it('when an option still has lines, then it is not removed', () => {
    const d = addChoice(empty);
    const key = d.options[0]!.key;
    const withLine = { ...d, lines: [{ uid: 'l', kind: 'other' as const, optionKey: key, description: 'x', taskId: '', hours: '', partId: '', quantity: '1', unitPrice: '1', unitCost: '' }] };
    expect(removeOption(withLine, key).options).toHaveLength(2);
    expect(removeOption(d, key).options).toHaveLength(1);
  });

  it('when the previewed option goes away, then the preview falls back to the first of its choice', () => {
    const d = addChoice(empty);
    const [first, second] = d.options;
    expect(previewKeys(d, [second!.key])).toEqual([second!.key]);
    expect(previewKeys(removeOption(d, second!.key), [second!.key])).toEqual([first!.key]);
  });
});
