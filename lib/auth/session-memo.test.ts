import { describe, expect, test } from "vitest";
import { createSessionMemo, sessionMemoKey } from "./session-memo";

/** A compact session_data copy as better-auth writes it: base64url JSON with `expiresAt` (ms). */
const copy = (expiresAt: number) => Buffer.from(JSON.stringify({ session: {}, expiresAt, signature: "sig" })).toString("base64url");
const session = (expiresAt: number) => ({ session: { expiresAt: new Date(expiresAt) }, user: { id: "u1" } });

describe("session memo", () => {
  test("needs both cookies, exactly as sent", () => {
    expect(sessionMemoKey("better-auth.session_token=t.sig")).toBeNull();
    expect(sessionMemoKey(null)).toBeNull();
    expect(sessionMemoKey(`a=1; better-auth.session_token=t.sig; better-auth.session_data=${copy(5)}`)).toBe(`t.sig\n${copy(5)}`);
    expect(sessionMemoKey(`__Secure-better-auth.session_token=t; __Secure-better-auth.session_data=d`)).toBe("t\nd");
  });

  test("asks better-auth once per cookie pair while the copy is valid, capped at 30 s", async () => {
    let clock = 1_000_000;
    const memo = createSessionMemo<ReturnType<typeof session>>(() => clock);
    let loads = 0;
    const load = async () => {
      loads += 1;
      return session(clock + 86_400_000);
    };
    const header = `better-auth.session_token=t.sig; better-auth.session_data=${copy(clock + 300_000)}`;
    await memo.get(header, load);
    await memo.get(header, load);
    expect(loads).toBe(1);
    clock += 29_000;
    await memo.get(header, load);
    expect(loads).toBe(1);
    clock += 2_000; // past the 30 s cap
    await memo.get(header, load);
    expect(loads).toBe(2);
    await memo.get(`better-auth.session_token=other.sig; better-auth.session_data=${copy(clock + 300_000)}`, load);
    expect(loads).toBe(3);
  });

  test("never outlives the copy's own expiry, and remembers no signed-out answer", async () => {
    let clock = 5_000;
    const memo = createSessionMemo<ReturnType<typeof session>>(() => clock);
    let loads = 0;
    const header = `better-auth.session_token=t; better-auth.session_data=${copy(clock + 1_000)}`;
    const load = async () => {
      loads += 1;
      return session(clock + 86_400_000);
    };
    await memo.get(header, load);
    clock += 1_000;
    await memo.get(header, load);
    expect(loads).toBe(2);
    let anonymous = 0;
    const none = async () => {
      anonymous += 1;
      return null;
    };
    await memo.get("better-auth.session_token=x; better-auth.session_data=y", none);
    await memo.get("better-auth.session_token=x; better-auth.session_data=y", none);
    expect(anonymous).toBe(2);
  });
});
