"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { authRequest } from "@/lib/auth/client";

export function SignOutButton() {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [failed, setFailed] = useState(false);
  return (
    <>
      <button
        type="button"
        disabled={pending}
        onClick={() =>
          start(async () => {
            const answer = await authRequest("sign-out");
            setFailed(!answer.ok);
            if (!answer.ok) return;
            router.push("/");
            router.refresh();
          })
        }
        className="rounded-full border border-walnut/25 px-3.5 py-1.5 text-sm font-bold text-walnut hover:border-walnut disabled:opacity-60"
      >
        {pending ? "Signing out…" : "Sign out"}
      </button>
      {failed ? <span role="alert" className="text-sm text-madder">Signing out did not work. Please try again.</span> : null}
    </>
  );
}
