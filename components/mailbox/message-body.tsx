import { Text } from '@/components/ui/text';

// Phones show the plain-text part; the web build renders the HTML (message-body.web.tsx).
export function MessageBody({ text }: { html: string; text: string; title: string }) {
  return <Text>{text}</Text>;
}
