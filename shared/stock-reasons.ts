// A stock reason fills the comment with editable text, so a reviewer who picks "Mirror not
// flagged" need not type it again. Text the reviewer typed is never thrown away: choosing
// another reason replaces only text a stock reason put there, and otherwise goes in front.
export const stockReasonText = (reason: string) => `${reason}.`;

export function commentAfterStockReason(comment: string, previous: string | null, next: string | null): string {
  const typed = comment.trim();
  const onlyStock = typed === '' || (previous !== null && typed === stockReasonText(previous));
  if (onlyStock) return next ? stockReasonText(next) : '';
  if (!next || typed.startsWith(stockReasonText(next))) return comment;
  const withoutPrevious =
    previous && typed.startsWith(stockReasonText(previous)) ? typed.slice(stockReasonText(previous).length).trim() : typed;
  return `${stockReasonText(next)} ${withoutPrevious}`;
}
