export * from './palette';
export * from './document';
export * from './geometry';
export * from './calibration';
export * from './marks';
export * from './svg';
export * from './subject';
