/** Shown beside every set of parameters and plots: what these numbers are and who must judge them. */
export function EngineeringCaution() {
  return (
    <p className="rounded-md border border-amber-200 bg-amber-50 px-3 py-2 text-xs text-amber-900" data-testid="engineering-caution">
      These are engineering calculations for review by a qualified geotechnical engineer. They depend on the quality of
      the sample and on how the test was run, and their use is subject to local codes and licensed professional practice.
    </p>
  );
}
