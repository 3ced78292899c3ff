// Work that must not hold up the answer runs here, after the response is sent. Tasks run one
// after another in this process, so two requests of one person are handled in the order they
// came; a failure is logged and never reaches the caller. In-process only: a task still waiting
// when the process stops is lost (the person simply asks again).
import type { Logger } from 'pino';

export interface BackgroundQueue {
  push(label: string, task: () => Promise<void>): void;
}

export function createBackgroundQueue(logger: Logger): BackgroundQueue {
  let tail: Promise<void> = Promise.resolve();
  return {
    push(label, task) {
      tail = tail.then(task).catch((error: unknown) => {
        logger.error({ err: error, task: label }, 'background task failed');
      });
    },
  };
}
