export * from './document';
export * from './calibration';
