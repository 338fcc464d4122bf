// Sign-up and sign-in: call the API, then keep the session on the device.
import { useMutation } from '@tanstack/react-query';
import { AuthResponse, authPaths, type LoginRequest, type RegisterRequest } from '@/shared/api/auth';
import { api } from '@/lib/api';
import { useSession } from '@/hooks/useSession';

export function useSignIn() {
  const signIn = useSession((s) => s.signIn);
  return useMutation({
    mutationFn: (body: LoginRequest) => api('POST', authPaths.login, AuthResponse, body),
    onSuccess: signIn,
  });
}

export function useSignUp() {
  const signIn = useSession((s) => s.signIn);
  return useMutation({
    mutationFn: (body: RegisterRequest) => api('POST', authPaths.register, AuthResponse, body),
    onSuccess: signIn,
  });
}
