import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { TextLink } from '@/components/ui/text-link';
import { paths, safeRedirect } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { redirectIfSignedIn } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) =>
    redirectIfSignedIn(queryClient, request);

export default function SignInRoute() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const redirectTo = searchParams.get('redirectTo');
  return (
    <AuthLayout
      title="Sign in"
      headingId="sign-in-heading"
      footer={
        <p>
          New here? <TextLink to={paths.auth.signUp.getHref(redirectTo)}>Create an account</TextLink>
        </p>
      }
    >
      <SignInForm onSuccess={() => navigate(safeRedirect(redirectTo), { replace: true })} />
    </AuthLayout>
  );
}
