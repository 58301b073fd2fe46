"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => void signOut({ callbackUrl: "/signin" })}
      className="min-h-11 rounded-plate border-2 border-paper px-3 font-bold text-paper hover:bg-harbour-deep"
    >
      Sign out
    </button>
  );
}
