import { createElement } from 'react';

// The HTML part in a sandboxed frame: no scripts, no access to Sightline's page.
export function MessageBody({ html, title }: { html: string; text: string; title: string }) {
  return createElement('iframe', {
    title,
    srcDoc: html,
    sandbox: '',
    style: { width: '100%', minHeight: 420, border: '1px solid #DDD8CE', borderRadius: 6, background: '#FFFFFF' },
  });
}
