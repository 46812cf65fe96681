import { boilCorrection } from '@shared/brewmath';
import { boilCorrectionRequestSchema } from '@shared/schemas/boil-check';
const b = { volumeL: 24, sg: 1.046, minutesLeft: 10, boilOffLPerHour: 3, targetSg: 1.05, targetVolumeL: 21 };
for (let k = 0; k < 3; k++) {
  let t = performance.now();
  for (let i = 0; i < 10000; i++) boilCorrectionRequestSchema.parse(b);
  const p = (performance.now() - t) / 10000;
  const parsed = boilCorrectionRequestSchema.parse(b);
  t = performance.now();
  let s = 0;
  for (let i = 0; i < 10000; i++) s += JSON.stringify(boilCorrection(parsed)).length;
  console.log('parse ms', p.toFixed(4), 'calc+stringify ms', ((performance.now() - t) / 10000).toFixed(4), s / 10000);
}
