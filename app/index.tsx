import { Redirect } from 'expo-router';

/** "/" opens the sketchbook (the (tabs) layout sends signed-out visitors to sign-in). */
export default function Index() {
  return <Redirect href="/sketches" />;
}
