/**
 * The run queue and this process's run workers. Placeholder until the queue lands: runs are not executed.
 */
export interface Jobs {
  close(): Promise<void>;
}

export function startJobs(): Jobs {
  return { close: async () => {} };
}
