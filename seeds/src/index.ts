export * from './staff';
export * from './records';
export * from './media/scenes';
export * from './media/shots';
