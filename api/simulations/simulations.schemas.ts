import { z } from 'zod';

/** Limits that keep one simulation from taking the server: clear errors beyond them. */
export const SIMULATION_LIMITS = {
  maxTextBytes: 1_000_000,
  maxSpecies: 600,
  maxSteps: 2_000,
  maxPoints: 2_000,
  maxRunSeconds: 120,
} as const;

const positive = z.number().finite().positive();
const concentration = z.number().finite().min(0);

/** How photolysis frequencies vary in time (the kinetics engine's light profiles). */
export const LightProfile = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('constant'), level: z.number().min(0).max(1) }),
  z.object({
    kind: z.literal('windows'),
    on: z.array(z.object({ start: z.number().min(0), end: z.number().min(0) })).min(1).max(1000),
  }),
  z.object({
    kind: z.literal('diurnal'),
    latitudeDeg: z.number().min(-90).max(90),
    declinationDeg: z.number().min(-23.5).max(23.5),
    noon: z.number().min(0),
    dayLength: positive.optional(),
  }),
]);
export type LightProfile = z.infer<typeof LightProfile>;

export const SimulationInputs = z
  .object({
    conditions: z.object({ T: positive.optional(), P: positive.optional(), M: positive.optional() }).default({}),
    initial: z.record(z.string().min(1).max(100), concentration),
    fixed: z.array(z.string().min(1).max(100)).max(SIMULATION_LIMITS.maxSpecies).default([]),
    tEnd: positive,
    points: z.number().int().min(2).max(SIMULATION_LIMITS.maxPoints).default(200),
    spacing: z.enum(['linear', 'log']).default('log'),
    light: LightProfile.default({ kind: 'constant', level: 1 }),
    steadyState: z.boolean().default(true),
    rtol: z.number().min(1e-12).max(1e-1).default(1e-6),
    atol: z.number().positive().max(1e10).optional(),
  })
  .refine((v) => Object.keys(v.initial).length > 0, { message: 'Give at least one initial concentration', path: ['initial'] });
export type SimulationInputs = z.infer<typeof SimulationInputs>;
/** What a client may send: fields with defaults may be left out. */
export type SimulationInputsBody = z.input<typeof SimulationInputs>;

export const StartSimulationBody = z
  .object({
    text: z.string().max(SIMULATION_LIMITS.maxTextBytes).optional(),
    revisionId: z.number().int().positive().optional(),
    inputs: SimulationInputs,
  })
  .refine((v) => (v.text === undefined) !== (v.revisionId === undefined), {
    message: 'Give either the mechanism text or a revision id, not both',
    path: ['text'],
  });
export type StartSimulationBody = z.infer<typeof StartSimulationBody>;

export const SimulationParams = z.object({ id: z.string().uuid() });

export const SIMULATION_STATUSES = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export type SimulationStatus = (typeof SIMULATION_STATUSES)[number];

// The web shows what the API returns: it takes the result type from here (types only, no engine code).
export type { SimulationResult } from '../chemistry/kinetics/simulation-types';
