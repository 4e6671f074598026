/** The foot of every page, carrying the standing safety note for anyone acting on growing advice. */
export function SiteFooter() {
  return (
    <footer className="mt-16 border-t border-rule bg-bark-wash">
      <div className="mx-auto grid max-w-6xl gap-6 px-4 py-8 sm:px-6 md:grid-cols-[2fr_1fr]">
        <section aria-labelledby="footer-safety" className="max-w-prose">
          <h2 id="footer-safety" className="text-base text-bark">
            Working safely around trees
          </h2>
          <p className="mt-2 text-sm">
            Tree work can mean sharp tools, ladders, heavy containers and digging where cables or pipes may be buried. Follow
            your local codes and the label of any product you use, and ask a licensed arborist before taking on a large tree.
          </p>
        </section>
        <p className="text-sm text-ink-soft md:text-right">
          Grovewalk · filmed garden walks, named trees.
          <br />
          Demo clubs, people and cultivars on this site are invented.
        </p>
      </div>
    </footer>
  );
}
