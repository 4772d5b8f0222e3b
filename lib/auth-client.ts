"use client";
import { createAuthClient } from "better-auth/react";

/** Browser-side auth calls (sign-in, sign-out). Same-origin, so no baseURL is needed. */
export const authClient = createAuthClient();
export const { signIn, signOut, useSession } = authClient;
