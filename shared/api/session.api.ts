import { CsrfResponseSchema, SessionResponseSchema, SignInBodySchema, SignUpBodySchema } from '../schemas/auth.schemas';
import { endpoint } from './endpoint';
import { firstLoadPaths } from './first-load-addresses';

/** Signing in and out, a client's own sign-up, and the CSRF token every write carries. */
export const sessionApi = {
  csrf: endpoint({ ...firstLoadPaths.csrf, access: 'public', summary: 'A CSRF token for writes', response: CsrfResponseSchema }),
  signIn: endpoint({ method: 'post', path: '/api/session', access: 'public', summary: 'Sign in', body: SignInBodySchema, response: SessionResponseSchema }),
  current: endpoint({ ...firstLoadPaths.session, access: 'signed_in', summary: 'The signed-in user', response: SessionResponseSchema }),
  signOut: endpoint({ method: 'delete', path: '/api/session', access: 'public', summary: 'Sign out', status: 204 }),
  signUp: endpoint({
    method: 'post',
    path: '/api/sign-up',
    access: 'public',
    summary: 'A client creates an account',
    body: SignUpBodySchema,
    response: SessionResponseSchema,
    status: 201,
  }),
};
