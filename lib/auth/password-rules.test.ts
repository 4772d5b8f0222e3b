import { describe, expect, test } from "vitest";
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "./password-rules";
import { PasswordField } from "./teacher-sign-up";

describe("password rules", () => {
  test("sign-up accepts exactly the lengths the shared limits allow", () => {
    expect(PasswordField.safeParse("x".repeat(MIN_PASSWORD_LENGTH - 1)).success).toBe(false);
    expect(PasswordField.safeParse("x".repeat(MIN_PASSWORD_LENGTH)).success).toBe(true);
    expect(PasswordField.safeParse("x".repeat(MAX_PASSWORD_LENGTH)).success).toBe(true);
    expect(PasswordField.safeParse("x".repeat(MAX_PASSWORD_LENGTH + 1)).success).toBe(false);
  });

  test("limits are sensible: at least 8 (NIST SP 800-63B, from memory) and room for a passphrase", () => {
    expect(MIN_PASSWORD_LENGTH).toBeGreaterThanOrEqual(8);
    expect(MAX_PASSWORD_LENGTH).toBeGreaterThanOrEqual(64);
  });
});
