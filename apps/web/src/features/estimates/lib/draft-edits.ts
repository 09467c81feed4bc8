import { choicesOf, newKey, type EstimateDraft, type LineDraft } from './estimate-draft';

/** Pure edits of an estimate draft; each returns a new draft. */

export const updateLine = (d: EstimateDraft, uid: string, changes: Partial<LineDraft>): EstimateDraft => ({
  ...d,
  lines: d.lines.map((l) => (l.uid === uid ? { ...l, ...changes } : l)),
});

export const addLine = (d: EstimateDraft, line: LineDraft): EstimateDraft => ({ ...d, lines: [...d.lines, line] });

export const removeLine = (d: EstimateDraft, uid: string): EstimateDraft => ({ ...d, lines: d.lines.filter((l) => l.uid !== uid) });

/** A new choice with two unnamed options, titled so it cannot merge with another choice. */
export function addChoice(d: EstimateDraft): EstimateDraft {
  const taken = new Set(d.options.map((o) => o.choice.trim().toLowerCase()));
  let n = choicesOf(d.options).length + 1;
  while (taken.has(`choice ${n}`)) n++;
  const choice = `Choice ${n}`;
  return { ...d, options: [...d.options, { key: newKey('opt'), choice, name: '' }, { key: newKey('opt'), choice, name: '' }] };
}

/** Renames a choice on every option that answers it. */
export function renameChoice(d: EstimateDraft, from: string, to: string): EstimateDraft {
  const id = from.trim().toLowerCase();
  return { ...d, options: d.options.map((o) => (o.choice.trim().toLowerCase() === id ? { ...o, choice: to } : o)) };
}

export const addOption = (d: EstimateDraft, choice: string): EstimateDraft => ({ ...d, options: [...d.options, { key: newKey('opt'), choice, name: '' }] });

export const renameOption = (d: EstimateDraft, key: string, name: string): EstimateDraft => ({
  ...d,
  options: d.options.map((o) => (o.key === key ? { ...o, name } : o)),
});

/** Options with lines are kept: their lines are moved or removed first, so no price vanishes unseen. */
export function removeOption(d: EstimateDraft, key: string): EstimateDraft {
  if (d.lines.some((l) => l.optionKey === key)) return d;
  return { ...d, options: d.options.filter((o) => o.key !== key) };
}

/** Keeps the previewed options valid: one per choice, falling back to the first. */
export function previewKeys(d: EstimateDraft, wanted: readonly string[]): string[] {
  return choicesOf(d.options).flatMap((c) => {
    const pick = c.options.find((o) => wanted.includes(o.key)) ?? c.options[0];
    return pick ? [pick.key] : [];
  });
}
