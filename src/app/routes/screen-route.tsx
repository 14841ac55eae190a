import { useParams } from 'react-router';
import { PitScreenPage } from '../../features/screen/components/pit-screen-page';

/** The pit screen, outside the signed-in shell: the token in the address is its only key. */
export function ScreenRoute() {
  const { token = '' } = useParams();
  return <PitScreenPage key={token} token={token} />;
}
