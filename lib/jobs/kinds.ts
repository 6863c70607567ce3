/** Job kinds in the queue. */
export const READ_JOB = "read";
export const SUGGEST_JOB = "suggest";
export const TRAIN_JOB = "train";
export const MAIL_JOB = "mail";
export const MAIL_INTAKE_JOB = "mail_intake";
export const RESET_REQUEST_JOB = "reset_request";
export const TOKENIZE_JOB = "tokenize";
export const IMPORT_JOB = "import";
