export { JettingModule } from './jetting.module.js';
export { AirDensityBaseline, type AirDensityBaselineDay } from './air-density-baseline.js';
