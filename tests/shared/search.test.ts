import { fullTextQuery, likePrefix, looksLikeClaimReference, searchTerms } from '../../shared/search';

describe('job search terms', () => {
  it('keeps words of three letters or more for the word search, each as a required prefix', () => {
    expect(fullTextQuery(searchTerms('12 Ald row')!)).toBe('+Ald* +row*');
    expect(fullTextQuery(searchTerms('MRK-26-0421')!)).toBe('+MRK* +0421*');
    expect(searchTerms('   ')).toBeNull();
  });

  it("escapes LIKE's wildcards so they are matched literally", () => {
    expect(likePrefix('50%_off\\')).toBe('50\\%\\_off\\\\%');
  });

  it('tells a claim number from words', () => {
    expect(looksLikeClaimReference('MRK-26-0421')).toBe(true);
    expect(looksLikeClaimReference('0421')).toBe(true);
    expect(looksLikeClaimReference('Alder Row')).toBe(false);
    expect(looksLikeClaimReference('Dunmere')).toBe(false);
  });
});
