/**
 * Safety cautions for the work that can hurt someone: moving a piano, restringing and pitch raising,
 * lead key weights, finishing solvents and sprays. Each is one calm sentence shown beside the work,
 * and the facts behind it, each naming its source as TRADE.md §7 labels it (or "common practice").
 * They point to the rules and never replace local codes or licensed practice.
 */

export type SafetyCautionId = 'moving' | 'restringing' | 'lead-key-weights' | 'finishing';

/** One fact behind a caution and where it comes from. */
export interface SafetyFact {
  text: string;
  /** As TRADE.md §7 labels it, e.g. "HSE L23/INDG143 [S14b]", or "common practice". */
  source: string;
}

export interface SafetyCaution {
  id: SafetyCautionId;
  /** Short name, e.g. for "Caution: moving a piano". Lower case after the first word. */
  title: string;
  /** The one sentence shown beside the work. */
  sentence: string;
  /** The sources of the sentence, as TRADE.md §7 labels them. */
  source: string;
  /** Fragment of the safety help page that explains this caution: /help/safety#<helpAnchor>. */
  helpAnchor: string;
  facts: readonly SafetyFact[];
}

/** In the order the help page lists them and `cautionsForWork` returns them. */
export const SAFETY_CAUTIONS: readonly SafetyCaution[] = [
  {
    id: 'moving',
    title: 'Moving a piano',
    sentence:
      'A piano is very heavy (an upright about 220–270 kg, a concert grand up to about 540 kg), so avoid lifting it where you can and otherwise move it as a trained team with the right aids.',
    source: '[S14a]; Manual Handling Operations Regulations 1992, HSE L23/INDG143 [S14b]',
    helpAnchor: 'moving',
    facts: [
      { text: 'An upright weighs about 220–270 kg, a baby grand about 230–270 kg and a concert grand up to about 540 kg.', source: '[S14a], consumer sources' },
      {
        text: 'In the UK the Manual Handling Operations Regulations 1992 ask you to avoid the lift where you can, assess what remains, and reduce the risk with handling aids and team handling.',
        source: 'HSE L23/INDG143 [S14b]',
      },
    ],
  },
  {
    id: 'restringing',
    title: 'Restringing and pitch raising',
    sentence: 'Strings can whip out when they break, so wear eye protection, and release and apply tension in sequence so the plate does not crack.',
    source: '[S14c], [S14d]; eye protection: common practice',
    helpAnchor: 'restringing',
    facts: [
      { text: 'A string under tension can whip out when it breaks.', source: '[S14c]' },
      { text: 'Wear eye protection when raising pitch or restringing.', source: 'common practice' },
      { text: 'Release and apply string tension in sequence, so that the plate does not crack.', source: '[S14d]' },
    ],
  },
  {
    id: 'lead-key-weights',
    title: 'Lead key weights',
    sentence: 'Key leads are lead, so wash your hands before eating and never dry-sand or drill them (in the UK the Control of Lead at Work Regulations 2002).',
    source: 'Control of Lead at Work Regulations 2002 [S14e, S14f]',
    helpAnchor: 'lead-key-weights',
    facts: [
      { text: 'In the UK, work with lead falls under the Control of Lead at Work Regulations 2002.', source: 'Control of Lead at Work Regulations 2002 [S14e]' },
      { text: 'After handling lead, wash before eating.', source: '[S14e, S14f]' },
      { text: 'Do not dry-sand or drill lead key weights.', source: '[S14e, S14f]' },
    ],
  },
  {
    id: 'finishing',
    title: 'Finishing solvents and sprays',
    sentence: 'Finishing solvents are flammable and isocyanate sprays are harmful, so keep solvents in fire-resisting storage and wear an air-fed mask until the spray booth clears.',
    source: 'DSEAR 2002 [S14g], HSG51 [S14h]; [S14i]; HSG258 [S14j]',
    helpAnchor: 'finishing',
    facts: [
      { text: 'Flammable solvents need a risk assessment under the Dangerous Substances and Explosive Atmospheres Regulations 2002.', source: 'DSEAR 2002 [S14g]' },
      { text: 'Store flammable solvents in fire-resisting storage.', source: 'HSG51 [S14h]' },
      { text: 'Sprays containing isocyanates need an air-fed mask, kept on until the booth has cleared.', source: '[S14i]' },
      { text: 'Extraction, such as a spray booth’s, is examined at least every 14 months.', source: 'HSG258 [S14j]' },
    ],
  },
];

/**
 * Plain keywords per caution, matched as whole words (with their usual endings) in lower case.
 * "Strip down" (taking a piano apart) is not stripping a finish, and measuring string heights
 * does not change tension, so neither calls for a caution.
 */
const KEYWORDS: Record<SafetyCautionId, RegExp> = {
  moving: /\b(mov(e|es|ed|ing)|deliver(s|y|ies|ed|ing)?|collect(s|ed|ing|ion|ions)?)\b/,
  restringing: /\b(re ?string(s|ing)?|restrung|strings?(?! heights?\b)|stringing|pitch rais(e|es|ed|ing)|tuning pins?)\b/,
  'lead-key-weights': /\b(key ?weights?|key ?weighting|leads?|leaded|rebalanc(e|es|ed|ing))\b/,
  finishing: /\b(re ?finish(es|ed|ing)?|polish(es|ed|ing)?|lacquer(s|ed|ing)?|polyester|spray(s|ed|ing)?|shellac|strip(s|ped|ping)?(?! down\b))\b/,
};

/** Lower case, hyphens and punctuation as spaces, so "Pitch-raise" and "re-string" match too. */
const normalise = (text: string) => text.toLowerCase().replace(/[^\p{L}\p{N}]+/gu, ' ').trim();

/**
 * The cautions for a piece of work named by a task or stage title or a catalogue operation name,
 * found by plain keywords (restring, string, pitch raise, tuning pin; key weight, lead, rebalance;
 * refinish, polish, lacquer, polyester, spray, shellac, strip; deliver, collect, move). In the
 * order of SAFETY_CAUTIONS; empty when nothing matches.
 */
export function cautionsForWork(text: string): SafetyCaution[] {
  const plain = normalise(text);
  if (plain === '') return [];
  return SAFETY_CAUTIONS.filter((caution) => KEYWORDS[caution.id].test(plain));
}

/**
 * The cautions a job's stage brings with it: only moving, when the stage name mentions delivery,
 * collection or moving (e.g. a "Delivery" stage). Other work is cautioned on its own tasks.
 */
export function cautionsForStage(stageName: string | null | undefined): SafetyCaution[] {
  return cautionsForWork(stageName ?? '').filter((caution) => caution.id === 'moving');
}

/** A task's cautions: those its title calls for, plus moving when its stage is about delivery or collection. */
export function cautionsForTask(title: string, stageName?: string | null): SafetyCaution[] {
  const ids = new Set([...cautionsForWork(title), ...cautionsForStage(stageName)].map((c) => c.id));
  return SAFETY_CAUTIONS.filter((caution) => ids.has(caution.id));
}
