// One focus style for every control on the web build: the blue ring with an offset, and a
// white halo inside it so the ring shows on dark fills (a selected chip, the sidebar) as well
// as on paper. Only keyboard focus (:focus-visible) shows it.
import { colors } from './theme';

const CSS = `
a:focus-visible, button:focus-visible, input:focus-visible, textarea:focus-visible, select:focus-visible,
[role="button"]:focus-visible, [role="radio"]:focus-visible, [role="checkbox"]:focus-visible, [role="link"]:focus-visible,
[role="tab"]:focus-visible, [role="row"]:focus-visible, [role="group"][tabindex]:focus-visible, [tabindex="0"]:focus-visible {
  outline: 3px solid ${colors.focus} !important;
  outline-offset: 2px !important;
  box-shadow: 0 0 0 2px ${colors.surface} !important;
}
[tabindex="-1"]:focus { outline: none; }
`;

export function installFocusStyle() {
  if (typeof document === 'undefined' || document.getElementById('sightline-focus-style')) return;
  const style = document.createElement('style');
  style.id = 'sightline-focus-style';
  style.textContent = CSS;
  document.head.appendChild(style);
}
