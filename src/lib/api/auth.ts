import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type {
  AuthUser,
  MessageResponse,
  PasswordResetConfirm,
  PasswordResetRequest,
  SignIn,
  SignUp,
} from "@shared/schemas/auth.ts";
import { ApiError, apiRequest, forgetEarlyRequests } from "./api-client.ts";

/**
 * The answers are parsed with the shared schemas as everywhere, but the schemas (and zod with
 * them) load when an answer arrives, not with the app's first script: the sign-in screen, whose
 * session check answers 401, never needs them, and a signed-in screen fetches them beside its own.
 */
const authSchemas = () => import("@shared/schemas/auth.ts");

/** The signed-in user, or null when there is no session (401). Other failures throw. */
export async function getMe(signal?: AbortSignal): Promise<AuthUser | null> {
  try {
    const payload = await apiRequest("/auth/me", { signal });
    return (await authSchemas()).MeResponseSchema.parse(payload).user;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export async function signIn(input: SignIn): Promise<AuthUser> {
  const payload = await apiRequest("/auth/sign-in", { method: "POST", body: input });
  return (await authSchemas()).MeResponseSchema.parse(payload).user;
}

export async function signUp(input: SignUp): Promise<AuthUser> {
  const payload = await apiRequest("/auth/sign-up", { method: "POST", body: input });
  return (await authSchemas()).MeResponseSchema.parse(payload).user;
}

export function signOut(): Promise<void> {
  return apiRequest("/auth/sign-out", { method: "POST" });
}

export async function requestPasswordReset(input: PasswordResetRequest): Promise<MessageResponse> {
  const payload = await apiRequest("/auth/password-reset/request", { method: "POST", body: input });
  return (await authSchemas()).MessageResponseSchema.parse(payload);
}

export function confirmPasswordReset(input: PasswordResetConfirm): Promise<void> {
  return apiRequest("/auth/password-reset/confirm", { method: "POST", body: input });
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: ["auth", "me"],
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
    // Asked even offline, so that a start without signal and without data kept on the device
    // fails at once with "No connection" instead of waiting for the network with a blank page.
    networkMode: "always",
  });

export const useMe = () => useQuery(meQueryOptions());

/** Signing in or up replaces whatever the cache held for a previous user. */
function useSessionStart<T>(request: (input: T) => Promise<AuthUser>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    meta: { silentErrors: true },
    onSuccess: (user) => {
      forgetEarlyRequests();
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
      forgetEarlyRequests();
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, null);
    },
  });
}

export const useRequestPasswordReset = () =>
  useMutation({ mutationFn: requestPasswordReset, meta: { silentErrors: true } });
export const useConfirmPasswordReset = () =>
  useMutation({ mutationFn: confirmPasswordReset, meta: { silentErrors: true } });
