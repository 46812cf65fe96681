// Each feature registers its demo data here, in order (recipes before brew days, and so on).
import './recipes/demo-seed';
import './instruments/demo-seed';
import './brews/demo-seed';
import './fermentation/demo-seed';
import './reviews/demo-seed';
export {};
