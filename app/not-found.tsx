import Link from "next/link";
import { buttonStyles } from "@/components/ui/button-styles";

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-[60vh] max-w-md flex-col items-center justify-center gap-4 px-6 text-center">
      <p className="text-sm font-semibold uppercase tracking-widest text-accent">Not found</p>
      <h1 className="text-2xl font-bold">Nothing here, or not for you</h1>
      <p className="text-muted">The page doesn't exist, or your account doesn't have access to it. If someone sent you this link, ask them to check it.</p>
      <Link href="/" className={buttonStyles.primary}>
        Go to your home page
      </Link>
    </main>
  );
}
