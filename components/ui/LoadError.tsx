// Why a page's data did not load. The server answers 404 both for what does not exist and for
// what the user may not see, so "not found" is said in the page's own words; any other failure
// shows the error's message.
import { isApiError } from '@/lib/api';
import { Banner } from './Banner';

export function LoadError({ error, notFound, failed }: {
  error: Error;
  notFound: { title: string; text: string };
  /** The title for any other failure. */
  failed: string;
}) {
  const missing = isApiError(error, 'not_found');
  return (
    <Banner tone="error" title={missing ? notFound.title : failed}>
      {missing ? notFound.text : error.message}
    </Banner>
  );
}
