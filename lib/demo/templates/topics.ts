// Everyday sentences of office letters, shared by correspondence and covering letters.
import { COUNTERPARTIES } from "../people";

export const TOPICS = [
  "Thank you for meeting with us last week. As agreed, we will send the draft by the end of the month and follow up by telephone.",
  "We write to confirm that we have received the documents you sent. We will review them and let you know if anything else is needed.",
  "Further to our telephone call, I attach the list of questions we discussed. I would be grateful for your answers when convenient.",
  "Please note our new office hours from next month. We remain available by e-mail for anything urgent.",
  "I am following up on my letter of last month, to which we have not yet had a reply.",
  `We have spoken with ${COUNTERPARTIES[0]} about the delay, and they have promised an answer within ten days.`,
  "Please call me if anything is unclear; I am in the office every morning this week.",
  "We will keep the originals in our files unless you ask us to return them.",
];
