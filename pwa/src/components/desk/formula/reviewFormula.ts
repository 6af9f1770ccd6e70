import {
  checkFormula,
  EngineInputError,
  initialShearModulus,
  type MaterialModel,
} from '../../../engine';

/** A formula model as the engineer is typing it: values stay text until they parse. */
export interface FormulaDraft {
  name: string;
  energy: string;
  constants: { name: string; value: string }[];
}

export interface FormulaProblem {
  severity: 'error' | 'warning';
  message: string;
  /** 0-based character in the energy where a syntax error was found. */
  position?: number;
  /** Index of the constant row the problem is about. */
  constantIndex?: number;
}

export interface FormulaReview {
  /** The engine model, when there is no error. */
  model: Extract<MaterialModel, { kind: 'formula' }> | null;
  problems: FormulaProblem[];
  unknownNames: string[];
  /** Initial shear modulus μ₀, MPa, when the model evaluates. */
  mu0: number | null;
}

const IDENTIFIER = /^[A-Za-z_][A-Za-z0-9_]*$/;
const RESERVED = new Set(['I1', 'I2', 'pi', 'e']);

function constantProblems(draft: FormulaDraft): FormulaProblem[] {
  const problems: FormulaProblem[] = [];
  const seen = new Set<string>();
  draft.constants.forEach((constant, index) => {
    const name = constant.name.trim();
    const error = (message: string) =>
      problems.push({ severity: 'error', message, constantIndex: index });
    if (!IDENTIFIER.test(name))
      error(`constant name "${name}" must start with a letter and hold only letters, digits and _`);
    else if (RESERVED.has(name)) error(`${name} is taken: I1, I2, pi and e have fixed meanings`);
    else if (seen.has(name)) error(`constant ${name} is listed twice`);
    seen.add(name);
    if (!Number.isFinite(Number(constant.value)) || constant.value.trim() === '') {
      error(`value of ${name || 'this constant'} must be a number`);
    }
  });
  return problems;
}

/** Everything the editor says about a draft, from syntax to whether it behaves like rubber. */
export function reviewFormula(draft: FormulaDraft): FormulaReview {
  const none: FormulaReview = { model: null, problems: [], unknownNames: [], mu0: null };
  if (draft.energy.trim() === '') {
    return { ...none, problems: [{ severity: 'error', message: 'type the energy W(I1, I2)' }] };
  }
  const problems = constantProblems(draft);
  const names = draft.constants.map((c) => c.name.trim());
  const check = checkFormula(draft.energy, names);
  if (check.error) {
    problems.unshift({
      severity: 'error',
      message: check.error.message,
      ...(check.error.position === null ? {} : { position: check.error.position }),
    });
  }
  for (const unknown of check.unknownSymbols) {
    problems.push({
      severity: 'error',
      message: `${unknown} is not I1, I2 or one of the constants`,
    });
  }
  for (const unused of check.unusedConstants) {
    problems.push({
      severity: 'warning',
      message: `${unused} does not appear in W, so no fit can find its value`,
    });
  }
  if (problems.some((p) => p.severity === 'error')) {
    return { ...none, problems, unknownNames: [...check.unknownSymbols] };
  }
  const model = {
    kind: 'formula' as const,
    energy: draft.energy,
    constants: Object.fromEntries(draft.constants.map((c) => [c.name.trim(), Number(c.value)])),
  };
  try {
    const mu0 = initialShearModulus(model);
    if (!(mu0 > 0)) {
      problems.push({
        severity: 'warning',
        message: `initial shear modulus μ₀ = ${mu0.toPrecision(4)} MPa is not positive: no rubber is like that at these values`,
      });
    }
    return { model, problems, unknownNames: [], mu0 };
  } catch (error) {
    if (!(error instanceof EngineInputError)) throw error;
    problems.push({ severity: 'error', message: `cannot evaluate W at rest: ${error.reason}` });
    return { ...none, problems };
  }
}
