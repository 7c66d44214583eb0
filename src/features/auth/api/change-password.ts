import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

/** 204 on success; 400 `wrong_password` or `weak_password` with the field named. */
export const changePassword = (input: ChangePasswordInput) => api.post('/api/auth/password', input);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
