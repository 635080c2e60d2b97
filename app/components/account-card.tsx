/** The centred card used by sign-in, forgotten password and set-password pages. */
export function AccountCard({
  title,
  children,
}: {
  title: string;
  children: React.ReactNode;
}) {
  return (
    <main className="flex min-h-screen items-center justify-center px-4 py-12">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex items-center gap-2">
          <img src="/favicon.svg" alt="" className="h-8 w-8" />
          <span className="text-xl font-semibold tracking-tight">
            Turnledger
          </span>
        </div>
        <div className="panel">
          <h1 className="mb-4 text-xl font-semibold">{title}</h1>
          {children}
        </div>
      </div>
    </main>
  );
}
