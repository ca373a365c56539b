// The usual cautions shown beside a treatment where the work can hurt someone or something:
// earthwork, drainage, spreading lime or gypsum, digging. Plain words; local rules win.
import type { TreatmentKey } from './types';
export const CAUTIONS = {
  earthwork:
    'Earthwork needs a design to local standards by a qualified person (an engineer or the local conservation office); follow local codes and permits.',
  utilities: 'Check for buried utilities before any digging (call the local one-call service).',
  drainage:
    'Drainage needs a design to local standards by a qualified person, with a safe outlet; local codes and permits may apply to where the water goes.',
  dust: 'Wear dust protection (mask, eye protection) when handling or spreading lime or gypsum; keep children and animals away while spreading.',
  label: "Follow the product's label for handling, rate and timing.",
  nutrients: "Check the compost's nutrients against the field's nutrient budget (NRCS practice 590) before spreading.",
  sizing: 'The sizes here are planning estimates, not a design.',
} as const;

export type CautionKey = keyof typeof CAUTIONS;

/**
 * The cautions that go with each treatment's work, wherever the work is shown: a field's
 * options, a plan, a printed report. Work with none (cover crops, tillage, contouring) is
 * farmed as usual.
 */
export const TREATMENT_CAUTIONS: Readonly<Record<TreatmentKey, readonly CautionKey[]>> = Object.freeze({
  'cover-crop': [],
  'no-till': [],
  'reduced-till': [],
  'contour-farming': [],
  'strip-cropping': [],
  terraces: ['earthwork', 'utilities', 'sizing'],
  'grassed-waterway': ['earthwork', 'utilities', 'sizing'],
  'filter-strip': ['sizing'],
  gypsum: ['dust', 'label'],
  lime: ['dust', 'label'],
  'organic-matter': ['nutrients', 'label'],
  'raised-beds': ['utilities'],
  drainage: ['drainage', 'utilities'],
  'permanent-cover': [],
});

/** The caution sentences of a treatment, in the order above. */
export const cautionsFor = (key: TreatmentKey): string[] => TREATMENT_CAUTIONS[key].map((k) => CAUTIONS[k]);

/**
 * Work that can hurt someone or something when done wrong: wherever a list shows it, the list
 * also carries DEFER_TO_LOCAL_PRACTICE.
 */
export const CAREFUL_WORK: readonly TreatmentKey[] = ['terraces', 'grassed-waterway', 'raised-beds', 'drainage', 'lime', 'gypsum'];

export const DEFER_TO_LOCAL_PRACTICE =
  'This plan is a planning aid, not a design or a prescription. Local standards, codes and permits come first: have earthwork and drainage designed, and lime and gypsum rates checked, by a licensed or certified professional before the work starts.';
