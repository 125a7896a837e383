/** An e-mail address that, when space is short, breaks before the @ rather than mid-word. */
export function EmailText({ email }: { email: string }) {
  const at = email.lastIndexOf('@');
  if (at <= 0) return <span>{email}</span>;
  return (
    <span>
      {email.slice(0, at)}
      <wbr />
      {email.slice(at)}
    </span>
  );
}
