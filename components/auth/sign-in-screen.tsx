import { PublicCard } from '@/components/account/public-card';
import { Text } from '@/components/ui/text';

import { SignInForm } from './sign-in-form';

export function SignInScreen() {
  return (
    <PublicCard title="Sightline">
      <Text variant="muted">Quality control for 3D captures of damaged homes. Sign in with your work e-mail.</Text>
      <SignInForm />
    </PublicCard>
  );
}
