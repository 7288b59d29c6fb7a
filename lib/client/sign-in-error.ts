/**
 * next-auth v4 reports a failed credentials sign-in as `error: "CredentialsSignin"` (authorize returned null);
 * an error thrown inside authorize arrives as its message. Turn both into one sentence for the form.
 */
export function signInErrorMessage(error: string | null | undefined): string {
  if (!error) return "Sign-in failed. Please try again.";
  if (error === "CredentialsSignin") return "Wrong e-mail or password. Check both and try again.";
  if (/rate|too many/i.test(error)) return "Too many sign-in attempts. Wait a minute and try again.";
  if (/^[A-Z][A-Za-z]+$/.test(error)) return "Sign-in failed. Please try again.";
  return error;
}
