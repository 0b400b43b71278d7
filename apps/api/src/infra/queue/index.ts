export { TaskQueue, TASK_QUEUE } from './task-queue';
