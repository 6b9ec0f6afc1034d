// The one way a cut plan is named to people: "Cut plan 2 of R3" — its number within its revision,
// never the database id (which stays the plan's address in URLs and JSON).

/** "Cut plan 2 of R3"; `midSentence` gives "cut plan 2 of R3". */
export function cutPlanName(number: number, revisionNumber: number, { midSentence = false } = {}): string {
  return `${midSentence ? "cut" : "Cut"} plan ${number} of R${revisionNumber}`;
}
