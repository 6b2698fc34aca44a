import { ApiError } from '@/app/lib/errors';
import { apiRoute } from '@/app/lib/server/apiRoute';

/** Unknown API paths answer with the shared error JSON instead of the HTML 404 page. */
const notFound = apiRoute(async () => {
  throw new ApiError('not_found:route');
});
export { notFound as GET, notFound as POST, notFound as PATCH, notFound as PUT, notFound as DELETE };
