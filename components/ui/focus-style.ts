// Native builds draw their own focus; see focus-style.web.ts.
export function installFocusStyle() {}
