/** Shown on every signed-in page: what the numbers in Porestack are, and who must judge them. */
export function FooterCaution() {
  return (
    <footer className="border-t border-slate-200 bg-white">
      <p className="mx-auto max-w-6xl px-4 py-3 text-xs text-slate-500 sm:px-6">
        Porestack results are engineering calculations. A qualified geotechnical engineer must review them before use;
        they are subject to local codes and to licensed professional practice.
      </p>
    </footer>
  );
}
