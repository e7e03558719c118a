import Link from "next/link";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/server/session";
import { ROLE_HOME } from "@/lib/auth/roles";
import { Logo } from "@/components/ui/logo";
import { ProgressTrack } from "@/components/ui/progress-track";
import { buttonStyles } from "@/components/ui/button-styles";

export default async function Landing() {
  const user = await getSessionUser();
  if (user) redirect(ROLE_HOME[user.role]);
  return (
    <main className="mx-auto flex min-h-screen max-w-3xl flex-col justify-center gap-8 px-6 py-16">
      <div className="flex items-center gap-3 text-accent">
        <Logo className="h-10 w-10" />
        <span className="text-2xl font-bold tracking-tight">Tankwright</span>
      </div>
      <h1 className="text-4xl font-bold leading-tight tracking-tight">From dry ground to living water.</h1>
      <p className="max-w-xl text-lg text-muted">
        Every custom aquarium install in one place: the site survey and load check, the day on site, the weeks of cycling, the first fish, and the care after.
      </p>
      <ProgressTrack stage="cycling" />
      <div>
        <Link href="/sign-in" className={buttonStyles.primary}>
          Sign in
        </Link>
      </div>
    </main>
  );
}
