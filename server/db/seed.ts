/**
 * Demo data: an invented club and invented people (see README). Runs once: when the demo
 * organiser already exists the seed does nothing, so `npm start` can be run again safely.
 */
import { eq } from 'drizzle-orm';
import type { Db } from './client';
import { addMember, makeClub, makeUser } from './factories';
import { users } from './schema';

export const demoPassword = 'wortwise-demo';

export const demoPeople = {
  organiser: { email: 'tamsin@hollow-oak.example', displayName: 'Tamsin Ferrow' },
  mentor: { email: 'ivo@hollow-oak.example', displayName: 'Ivo Brannock' },
  brewer: { email: 'priya@hollow-oak.example', displayName: 'Priya Lindqvist' },
  secondBrewer: { email: 'jonah@hollow-oak.example', displayName: 'Jonah Weatherby', unitSystem: 'us' as const },
  admin: { email: 'admin@wortwise.example', displayName: 'Site Admin' },
};

export type DemoSeedHook = (db: Db, people: Record<keyof typeof demoPeople, { id: number }>, club: { id: number }) => Promise<void>;

/** Later features add their demo data (recipes, brew days, comments) through hooks. */
const hooks: DemoSeedHook[] = [];
export function registerDemoSeed(hook: DemoSeedHook) {
  hooks.push(hook);
}

export async function seedDemo(db: Db): Promise<boolean> {
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, demoPeople.organiser.email));
  if (existing) return false;
  await db.transaction(async (tx) => {
    const people = {
      organiser: await makeUser(tx, { ...demoPeople.organiser, password: demoPassword }),
      mentor: await makeUser(tx, { ...demoPeople.mentor, password: demoPassword }),
      brewer: await makeUser(tx, { ...demoPeople.brewer, password: demoPassword }),
      secondBrewer: await makeUser(tx, { ...demoPeople.secondBrewer, password: demoPassword }),
      admin: await makeUser(tx, { ...demoPeople.admin, password: demoPassword, siteRole: 'admin' }),
    };
    const club = await makeClub(tx, {
      name: 'Hollow Oak Homebrew Circle',
      description: 'An invented demo club: monthly brew days and tastings in the back room of the Hollow Oak community hall.',
      createdBy: people.organiser.id,
    });
    await addMember(tx, club.id, people.organiser.id, 'organiser');
    await addMember(tx, club.id, people.mentor.id, 'mentor');
    await addMember(tx, club.id, people.brewer.id, 'member');
    await addMember(tx, club.id, people.secondBrewer.id, 'member');
    for (const hook of hooks) await hook(tx as unknown as Db, people, club);
  });
  return true;
}
