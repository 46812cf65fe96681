/**
 * The usual short cautions where brewing work can hurt, in one place so they read the same on
 * every page. Each defers to the product's label and local rules rather than replacing them.
 */
export const cautionTexts = {
  chemicals:
    'Cleaning and sanitising products: wear gloves and eye protection, dilute and rinse exactly as the label says, and never mix two products.',
  phSolutions:
    'Buffer and storage solutions can irritate eyes and skin: wear eye protection, follow the label and its safety sheet, and rinse with plenty of water if splashed.',
  co2:
    'A CO2 cylinder is under high pressure: keep it upright and chained or strapped, use a regulator with a working gauge, keep the keg below its rated pressure with its relief valve working, and follow the supplier’s instructions and local rules.',
} as const;
