import { canOpen, homeFor, navFor } from '../../shared/navigation';
import { ROLES } from '../../shared/roles';

describe('role navigation', () => {
  it('lands each role on its own home', () => {
    expect(homeFor('technician')).toBe('/jobs');
    expect(homeFor('reviewer')).toBe('/queue');
    expect(homeFor('manager')).toBe('/trends');
    expect(homeFor('admin')).toBe('/admin/users');
  });

  it("lists each role's home in its menu", () => {
    for (const role of ROLES) expect(canOpen(role, homeFor(role))).toBe(true);
  });

  it('keeps the user admin page away from everyone but admins', () => {
    expect(ROLES.filter((role) => canOpen(role, '/admin/users'))).toEqual(['admin']);
    expect(navFor('technician').map((i) => i.label)).toEqual(['My jobs', 'My quality']);
  });

  it('shows the Mailbox to admins, and to every role only where the server opens it to all', () => {
    expect(ROLES.filter((role) => navFor(role).some((i) => i.href === '/mailbox'))).toEqual(['admin']);
    expect(ROLES.filter((role) => navFor(role, { mailboxOpen: true }).some((i) => i.href === '/mailbox'))).toEqual([...ROLES]);
  });
});

describe('kit and timing', () => {
  it('is a manager page', () => {
    expect(ROLES.filter((role) => canOpen(role, '/kit'))).toEqual(['manager']);
  });
});
