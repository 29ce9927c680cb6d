/**
 * Generates large, balanced mechanisms in the step notation for the engine bench and tests:
 * alkyl-peroxy chains C_nH_(2n+1) over n = 1…chains, six balanced step templates per chain
 * (association with M, NO oxidation, H abstraction by O2, HO2 termination, two photolyses),
 * then alkyl + alkyl recombinations until the wanted number of steps is reached.
 * Run as `npx tsx examples/generate-large.ts STEPS [CHAINS] > file.steps`.
 */

function alkyl(n: number, suffix: string): string {
  return `C${n === 1 ? '' : n}H${2 * n + 1}${suffix}`;
}

function chainSteps(n: number): string[] {
  const aldehyde = `C${n === 1 ? '' : n}H${2 * n}O`;
  const peroxide = `C${n === 1 ? '' : n}H${2 * n + 2}O2`;
  const steps = [
    `${alkyl(n, '•')} + O2 + M -> ${alkyl(n, 'O2•')} + M  @ 1.0e-30 * (T / 300)^-3.5`,
    `${alkyl(n, 'O2•')} + NO• -> ${alkyl(n, 'O•')} + NO2•  @ 2.6e-12 * exp(365 / T)`,
    `${alkyl(n, 'O•')} + O2 -> ${aldehyde} + HO2•  @ 7.2e-14 * exp(-1080 / T)`,
    `${alkyl(n, 'O2•')} + HO2• -> ${peroxide} + O2  @ 4.1e-13 * exp(750 / T)`,
    `${peroxide} + hν -> ${alkyl(n, 'O•')} + OH•  @ 5.0e-6`,
  ];
  if (n > 1) steps.push(`${aldehyde} + hν -> ${alkyl(n - 1, '•')} + HCO•  @ 2.0e-5`);
  return steps;
}

/** The fewest chains whose template and recombination steps reach `steps`. */
function chainsNeeded(steps: number): number {
  let chains = 1;
  while (6 * chains - 1 + (chains * (chains + 1)) / 2 < steps) chains += 1;
  return chains;
}

/**
 * A balanced mechanism of exactly `steps` labelled steps over `chains` alkyl chains (more when
 * that many cannot give enough steps). The default gives about one species per four steps, as in
 * large published mechanisms (common practice).
 */
export function generateMechanism(steps: number, requestedChains = Math.ceil(steps / 25)): string {
  const chains = Math.max(requestedChains, chainsNeeded(steps));
  const lines = [`%title Generated alkyl-peroxy mechanism (${steps} steps)`, '%conditions T = 298 K, P = 1 atm'];
  const body: string[] = [];
  for (let n = 1; n <= chains && body.length < steps; n += 1) body.push(...chainSteps(n));
  for (let a = 1; a <= chains && body.length < steps; a += 1) {
    for (let b = a; b <= chains && body.length < steps; b += 1) {
      body.push(`${alkyl(a, '•')} + ${alkyl(b, '•')} -> C${a + b}H${2 * (a + b) + 2}  @ 1.0e-11`);
    }
  }
  body.slice(0, steps).forEach((step, index) => lines.push(`G${index + 1}: ${step}`));
  return `${lines.join('\n')}\n`;
}

const invokedDirectly = typeof process !== 'undefined' && process.argv[1]?.endsWith('generate-large.ts');
if (invokedDirectly) {
  const steps = Number(process.argv[2] ?? 1000);
  const chains = process.argv[3] ? Number(process.argv[3]) : undefined;
  process.stdout.write(generateMechanism(steps, chains));
}
