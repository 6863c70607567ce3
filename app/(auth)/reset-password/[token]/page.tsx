import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/people/auth-card";
import { ChoosePasswordForm } from "@/components/people/choose-password-form";
import { Notice } from "@/components/ui/notice";
import { PASSWORD_RULES } from "@/lib/auth/password-rules";
import { checkLink } from "@/lib/data/account-tokens";

export const metadata: Metadata = { title: "Choose a new password" };

// Public on purpose: the one-time token in the address is the credential; nothing is used up by opening the page.
export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await checkLink(token, "reset");
  return (
    <AuthCard title="New password" lead="Choosing a new password signs you out on every other device.">
      {link.ok ? (
        <ChoosePasswordForm endpoint="/api/auth/reset-password" token={token} email={link.email} rules={PASSWORD_RULES} />
      ) : (
        <div className="space-y-3">
          <Notice tone="error" title="This link cannot be used">{link.message}</Notice>
          <Link href="/forgot-password" className="text-verdigris underline-offset-2 hover:underline">Ask for a new link</Link>
        </div>
      )}
    </AuthCard>
  );
}
