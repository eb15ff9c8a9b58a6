export function SiteFooter() {
  return (
    <footer className="no-print mt-12 border-t border-steel-200 bg-white">
      <div className="mx-auto max-w-6xl px-4 py-6 text-xs leading-relaxed text-steel-600">
        <p>
          A home-built press is not certified. Figures here are estimates: defer to local codes, the component makers&apos;
          ratings and a licensed engineer. Never set the relief valve above the lowest-rated component, relieve stored
          pressure and lock out before service, and never feel for a leak with your hand.
        </p>
      </div>
    </footer>
  );
}
