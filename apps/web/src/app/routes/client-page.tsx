import { useParams, useSearchParams } from 'react-router-dom';
import { ClientPageScreen } from '@/features/client-page/components/client-page-screen';

/** The client's private page behind their link: public, no app navigation. */
export function Component() {
  const { token = '' } = useParams();
  const [params] = useSearchParams();
  const deposit = params.get('deposit');
  // The payment page sends the client back with ?deposit=paid (or cancelled); ?paid=1 is read the same way.
  const returned = deposit === 'paid' || params.get('paid') === '1' ? 'paid' : deposit === 'cancelled' ? 'cancelled' : null;
  return <ClientPageScreen token={token} returned={returned} />;
}
