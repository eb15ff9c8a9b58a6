export function FormMessage({ message, tone = "error" }: { message?: string; tone?: "error" | "success" }) {
  if (!message) return null;
  const styles = tone === "error" ? "bg-fail-soft text-fail ring-fail/30" : "bg-ok-soft text-ok ring-ok/30";
  return (
    <p role={tone === "error" ? "alert" : "status"} className={`rounded-md px-3 py-2 text-sm ring-1 ${styles}`}>
      {message}
    </p>
  );
}
