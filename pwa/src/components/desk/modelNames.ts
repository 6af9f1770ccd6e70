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
