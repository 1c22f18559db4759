import { Slot } from 'expo-router';

// The adjuster's pages: public, no session, no navigation into the rest of Sightline.
export default function ShareLayout() {
  return <Slot />;
}
