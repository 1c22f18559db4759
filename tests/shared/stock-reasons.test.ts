import { commentAfterStockReason } from '../../shared/stock-reasons';

describe('commentAfterStockReason', () => {
  it('fills an empty comment with the reason as editable text', () => {
    expect(commentAfterStockReason('', null, 'Mirror not flagged')).toBe('Mirror not flagged.');
  });

  it('replaces text that only a stock reason put there, and clears it when the reason is dropped', () => {
    expect(commentAfterStockReason('Mirror not flagged.', 'Mirror not flagged', 'Glass door not flagged')).toBe('Glass door not flagged.');
    expect(commentAfterStockReason('Mirror not flagged.', 'Mirror not flagged', null)).toBe('');
  });

  it('keeps what the reviewer typed: the reason goes in front, and dropping the reason leaves the text', () => {
    expect(commentAfterStockReason('Bathroom, east wall', null, 'Mirror not flagged')).toBe('Mirror not flagged. Bathroom, east wall');
    expect(commentAfterStockReason('Mirror not flagged. Bathroom, east wall', 'Mirror not flagged', 'Glass door not flagged')).toBe(
      'Glass door not flagged. Bathroom, east wall',
    );
    expect(commentAfterStockReason('Mirror not flagged. Bathroom, east wall', 'Mirror not flagged', null)).toBe(
      'Mirror not flagged. Bathroom, east wall',
    );
  });
});
