import type { MaterialModel, ModelKind } from '../../engine';

/** Model names as the literature writes them. */
export const MODEL_NAMES: Record<ModelKind, string> = {
  'neo-hookean': 'neo-Hookean',
  'mooney-rivlin': 'Mooney–Rivlin',
  yeoh: 'Yeoh',
  ogden: 'Ogden',
  gent: 'Gent',
  'arruda-boyce': 'Arruda–Boyce',
  formula: 'formula',
};

/** A short label for one fitted model, e.g. "Ogden, 3 terms". */
export function modelLabel(model: MaterialModel): string {
  if (model.kind === 'ogden')
    return `Ogden, ${model.terms.length} term${model.terms.length === 1 ? '' : 's'}`;
  if (model.kind === 'formula') return `formula: ${model.energy}`;
  return MODEL_NAMES[model.kind];
}

/** A model's constants as name–value pairs, in the literature's symbols. */
export function modelConstants(model: MaterialModel): [string, number][] {
  switch (model.kind) {
    case 'neo-hookean':
      return [['C10', model.c10]];
    case 'mooney-rivlin':
      return [
        ['C10', model.c10],
        ['C01', model.c01],
      ];
    case 'yeoh':
      return [
        ['C10', model.c10],
        ['C20', model.c20],
        ['C30', model.c30],
      ];
    case 'ogden':
      return model.terms.flatMap((t, p): [string, number][] => [
        [`μ${p + 1}`, t.mu],
        [`α${p + 1}`, t.alpha],
      ]);
    case 'gent':
      return [
        ['μ', model.mu],
        ['Jm', model.jm],
      ];
    case 'arruda-boyce':
      return [
        ['μ', model.mu],
        ['N', model.n],
      ];
    case 'formula':
      return Object.entries(model.constants);
  }
}

/** Units of a constant: Ogden exponents, Gent's Jm and Arruda–Boyce's N have none, the rest MPa. */
export function constantUnit(name: string): string {
  return /^(α\d+|Jm|N)$/.test(name) ? '' : ' MPa';
}
