export default function PlannerLoading() {
  return (
    <div className="panel p-6 text-sm text-muted" role="status">
      Opening the Planner…
    </div>
  );
}
