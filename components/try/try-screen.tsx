import { ComingSoon } from '@/components/ui/coming-soon';

/** Placeholder for the visitor's one-off tape from two marks (built later). */
export function TryScreen() {
  return (
    <ComingSoon
      title="Try a tape"
      message="Soon you can enter two sighted marks here and print a one-off sight tape without an account. Saving it will need an account."
      backHref="/sign-in"
      backLabel="Back to sign in"
    />
  );
}
