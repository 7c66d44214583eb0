import { useMutation } from '@tanstack/react-query';
import type { ForgotPasswordInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

/** Always 202, whether or not the address has an account (no way to probe for accounts). */
export const requestPasswordReset = (input: ForgotPasswordInput) => api.post<unknown>('/api/auth/forgot', input);

export const useForgotPassword = () => useMutation({ mutationFn: requestPasswordReset });
