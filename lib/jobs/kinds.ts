/** Job kinds in the queue. */
export const READ_JOB = "read";
export const SUGGEST_JOB = "suggest";
export const TRAIN_JOB = "train";
