import { z } from 'zod';

export const emailSchema = z
  .string({ error: 'Enter your e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address.' }).max(254, { error: 'That e-mail address is too long.' }));

export const newPasswordSchema = z
  .string({ error: 'Choose a password.' })
  .min(10, { error: 'Use at least 10 characters.' })
  .max(200, { error: 'Use at most 200 characters.' });

export const displayNameSchema = z
  .string({ error: 'Tell us what to call you.' })
  .trim()
  .min(1, { error: 'Tell us what to call you.' })
  .max(80, { error: 'Use at most 80 characters.' });

export const signupSchema = z.object({
  email: emailSchema,
  password: newPasswordSchema,
  displayName: displayNameSchema,
});
export type SignupInput = z.input<typeof signupSchema>;

export const loginSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Enter your password.' }).min(1, { error: 'Enter your password.' }).max(200),
});
export type LoginInput = z.input<typeof loginSchema>;

export const unitSystems = ['metric', 'us'] as const;
export const gravityUnits = ['sg', 'plato'] as const;
/** Which gallon "US units" show volumes in: the US gallon (3.785 L) or the imperial one (4.546 L). */
export const gallonUnits = ['us', 'imperial'] as const;
export type GallonUnit = (typeof gallonUnits)[number];
export type UnitSystem = (typeof unitSystems)[number];
export type GravityUnit = (typeof gravityUnits)[number];
export const colourScales = ['srm', 'ebc'] as const;
export type ColourScalePreference = (typeof colourScales)[number];

export const preferencesSchema = z
  .object({
    unitSystem: z.enum(unitSystems, { error: 'Choose metric or US units.' }),
    gravityUnit: z.enum(gravityUnits, { error: 'Choose SG or °Plato.' }),
    colourScale: z.enum(colourScales, { error: 'Choose SRM or EBC.' }),
    gallonUnit: z.enum(gallonUnits, { error: 'Choose US gallons (3.785 L) or imperial gallons (4.546 L).' }),
    displayName: displayNameSchema,
  })
  .partial();
export type PreferencesInput = z.input<typeof preferencesSchema>;
export type Preferences = z.output<typeof preferencesSchema>;

export const clubRoleSchema = z.enum(['member', 'mentor', 'organiser']);
export type ClubRole = z.infer<typeof clubRoleSchema>;

/** The signed-in user as the API returns it. */
export const meSchema = z.object({
  id: z.number(),
  email: z.string(),
  displayName: z.string(),
  unitSystem: z.enum(unitSystems),
  gravityUnit: z.enum(gravityUnits),
  colourScale: z.enum(colourScales),
  gallonUnit: z.enum(gallonUnits),
  siteRole: z.enum(['user', 'admin']),
  clubs: z.array(z.object({ id: z.number(), name: z.string(), role: clubRoleSchema })),
});
export type Me = z.infer<typeof meSchema>;
