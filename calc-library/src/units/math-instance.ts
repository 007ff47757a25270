import {
  type FactoryFunctionMap,
  absDependencies,
  addDependencies,
  create,
  divideDependencies,
  eDependencies,
  evaluateDependencies,
  expDependencies,
  log10Dependencies,
  logDependencies,
  multiplyDependencies,
  piDependencies,
  powDependencies,
  sqrtDependencies,
  subtractDependencies,
  toDependencies,
  unaryMinusDependencies,
  unaryPlusDependencies,
  unitDependencies,
} from 'mathjs';

/**
 * The one mathjs instance of the library: only units, the expression parser and the few
 * functions the worksheet offers. A full `import { evaluate } from 'mathjs'` would put about
 * twice as much mathjs into the desk's bundle (see STACK.md).
 */
// mathjs types each dependency map as possibly undefined (under noUncheckedIndexedAccess);
// at run time they all exist, and create() fails loudly if one did not.
export const math = create({
  absDependencies,
  addDependencies,
  divideDependencies,
  eDependencies,
  evaluateDependencies,
  expDependencies,
  log10Dependencies,
  logDependencies,
  multiplyDependencies,
  piDependencies,
  powDependencies,
  sqrtDependencies,
  subtractDependencies,
  toDependencies,
  unaryMinusDependencies,
  unaryPlusDependencies,
  unitDependencies,
} as FactoryFunctionMap);
