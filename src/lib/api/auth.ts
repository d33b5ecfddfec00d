import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  MeResponseSchema,
  MessageResponseSchema,
  type AuthUser,
  type MessageResponse,
  type PasswordResetConfirm,
  type PasswordResetRequest,
  type SignIn,
  type SignUp,
} from "@shared/schemas/auth.ts";
import { ApiError, apiRequest } from "./api-client.ts";

/** The signed-in user, or null when there is no session (401). Other failures throw. */
export async function getMe(signal?: AbortSignal): Promise<AuthUser | null> {
  try {
    const { user } = await apiRequest("/auth/me", { schema: MeResponseSchema, signal });
    return user;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export async function signIn(input: SignIn): Promise<AuthUser> {
  return (await apiRequest("/auth/sign-in", { method: "POST", body: input, schema: MeResponseSchema })).user;
}

export async function signUp(input: SignUp): Promise<AuthUser> {
  return (await apiRequest("/auth/sign-up", { method: "POST", body: input, schema: MeResponseSchema })).user;
}

export function signOut(): Promise<void> {
  return apiRequest("/auth/sign-out", { method: "POST" });
}

export function requestPasswordReset(input: PasswordResetRequest): Promise<MessageResponse> {
  return apiRequest("/auth/password-reset/request", { method: "POST", body: input, schema: MessageResponseSchema });
}

export function confirmPasswordReset(input: PasswordResetConfirm): Promise<void> {
  return apiRequest("/auth/password-reset/confirm", { method: "POST", body: input });
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: ["auth", "me"],
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());

/** Signing in or up replaces whatever the cache held for a previous user. */
function useSessionStart<T>(request: (input: T) => Promise<AuthUser>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    meta: { silentErrors: true },
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, user);
    },
  });
}

export const useSignIn = () => useSessionStart(signIn);
export const useSignUp = () => useSessionStart(signUp);

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    // Nothing of the last user may stay on a shared tablet.
    onSettled: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, null);
    },
  });
}

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset, meta: { silentErrors: true } });
export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset, meta: { silentErrors: true } });
