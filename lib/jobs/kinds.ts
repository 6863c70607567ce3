/** Job kinds in the queue. */
export const READ_JOB = "read";
