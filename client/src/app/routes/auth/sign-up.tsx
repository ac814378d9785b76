import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { TextLink } from '@/components/ui/text-link';
import { paths, safeRedirect } from '@/config/paths';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { redirectIfSignedIn } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) =>
    redirectIfSignedIn(queryClient, request);

export default function SignUpRoute() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const redirectTo = searchParams.get('redirectTo');
  return (
    <AuthLayout
      title="Create an account"
      headingId="sign-up-heading"
      footer={
        <p>
          Already have one? <TextLink to={paths.auth.signIn.getHref(redirectTo)}>Sign in</TextLink>
        </p>
      }
    >
      <SignUpForm onSuccess={() => navigate(safeRedirect(redirectTo), { replace: true })} />
    </AuthLayout>
  );
}
