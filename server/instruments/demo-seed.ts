/**
 * Demo instruments and kettle for the invented Hollow Oak Homebrew Circle. Written through the
 * same services as the API, so each calibration has its history entry like a real one.
 */
import { registerDemoSeed } from '../db/seed';
import { createEquipment } from '../equipment/service';
import { calibrateInstrument, createInstrument } from './service';
import { DAY_MS, utcDay } from '@shared/dates';

const brewerActor = (id: number) => ({ id, siteRole: 'user' as const, memberships: [] });
const daysAgoIso = (days: number) => utcDay(new Date(Date.now() - days * DAY_MS));

registerDemoSeed(async (db, people) => {
  // Priya: a full set, calibrated.
  const priya = brewerActor(people.brewer.id);
  await createInstrument(db, priya, { kind: 'hydrometer', name: 'Trial-jar hydrometer', calibrationTempC: 20 });
  const refractometer = await createInstrument(db, priya, { kind: 'refractometer', name: 'Pocket refractometer' });
  // Three invented pairs from earlier brew days; their factors average 1.040.
  await calibrateInstrument(db, priya, refractometer.id, {
    method: 'wcf-pairs',
    hydrometerCalibrationTempC: 20,
    pairs: [
      { brix: 11.8, sg: 1.046, sampleTempC: 20 },
      { brix: 13.7, sg: 1.052, sampleTempC: 24 },
      { brix: 15.5, sg: 1.061, sampleTempC: 18 },
    ],
  });
  const thermometer = await createInstrument(db, priya, { kind: 'thermometer', name: 'Probe thermometer', notes: 'The one on the long lead.' });
  await calibrateInstrument(db, priya, thermometer.id, { method: 'thermometer-check', iceReadingC: 0.4 });
  const phMeter = await createInstrument(db, priya, { kind: 'ph_meter', name: 'Pen pH meter', resolutionPh: 0.01, reminderDays: 30 });
  await calibrateInstrument(db, priya, phMeter.id, { method: 'ph-two-point', calibratedOn: daysAgoIso(10), bufferLowPh: 4.01, bufferHighPh: 7 });
  await createEquipment(db, priya, {
    name: '35 L electric kettle',
    boilOffLPerHour: 4,
    trubLossL: 1.5,
    deadSpaceL: 0.5,
    coolingShrinkage: 0.04,
    elevationM: 85,
    kettleCapacityL: 35,
    boilOffMeasurement: { startL: 29, endL: 25, minutes: 60 },
  });

  // Jonah: an older 60 °F hydrometer and a refractometer still on the common-practice factor.
  const jonah = brewerActor(people.secondBrewer.id);
  await createInstrument(db, jonah, { kind: 'hydrometer', name: 'Triple-scale hydrometer', calibrationTempC: 15.56 });
  await createInstrument(db, jonah, { kind: 'refractometer', name: 'Refractometer' });
});
