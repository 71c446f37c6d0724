import { NotFoundMessage } from '../not-found-message';

export function Component() {
  return <NotFoundMessage />;
}
