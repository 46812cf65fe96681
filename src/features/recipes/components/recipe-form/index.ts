// The recipe form, one file per section; the read view shares its targets panel.
export { RecipeForm } from './recipe-form';
export { TargetsPanel } from './targets-panel';
