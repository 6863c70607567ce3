import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/people/auth-card";
import { ChoosePasswordForm } from "@/components/people/choose-password-form";
import { Notice } from "@/components/ui/notice";
import { PASSWORD_RULES } from "@/lib/auth/password-rules";
import { checkLink } from "@/lib/data/account-tokens";

export const metadata: Metadata = { title: "Accept your invitation" };

// Public on purpose: the one-time token in the address is the credential; nothing is used up by opening the page.
export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await checkLink(token, "invitation");
  return (
    <AuthCard title="Welcome to Foldwright" lead="Choose the password you will sign in with.">
      {link.ok ? (
        <ChoosePasswordForm endpoint="/api/auth/accept-invitation" token={token} email={link.email} rules={PASSWORD_RULES} />
      ) : (
        <div className="space-y-3">
          <Notice tone="error" title="This link cannot be used">{link.message}</Notice>
          <Link href="/sign-in" className="text-verdigris underline-offset-2 hover:underline">Go to sign-in</Link>
        </div>
      )}
    </AuthCard>
  );
}
