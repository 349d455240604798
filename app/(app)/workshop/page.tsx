import { listEnvelopeModels, listEnvelopeUnits, listMounts, listPayloadTemplates } from "@/db/queries/catalogue";
import { listUsers } from "@/db/queries/users";
import { RoleSelect } from "@/components/workshop/role-select";
import { MAKER_ONLY } from "@/lib/domain";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Workshop" };

const cell = "border-t border-hairline px-3 py-2";

export default async function WorkshopPage() {
  const viewer = await requirePageViewer(MAKER_ONLY, "/workshop");
  const [models, units, mounts, templates, users] = await Promise.all([
    listEnvelopeModels(),
    listEnvelopeUnits(),
    listMounts(),
    listPayloadTemplates(),
    listUsers(),
  ]);
  const modelName = new Map(models.map((m) => [m.id, m.name]));
  return (
    <section className="space-y-8">
      <div>
        <h1 className="text-2xl">Workshop</h1>
        <p className="text-sm text-muted">The catalogue customers plan with, and who may do what. Editing the catalogue comes next; it is read-only here.</p>
      </div>

      <div>
        <h2 className="mb-2 text-lg">Envelope models</h2>
        <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid="workshop-models">
          <thead className="text-left text-muted">
            <tr><th className="px-3 py-2">Model</th><th className="px-3 py-2">Gas volume</th><th className="px-3 py-2">Nominal mass</th><th className="px-3 py-2">Rail</th></tr>
          </thead>
          <tbody>
            {models.map((m) => (
              <tr key={m.id}>
                <td className={cell}>{m.name}</td>
                <td className={`${cell} figure`}>{m.gasVolumeM3.toFixed(2)}<span className="unit">m³</span></td>
                <td className={`${cell} figure`}>{(m.nominalMassKg * 1000).toFixed(0)}<span className="unit">g</span></td>
                <td className={`${cell} figure`}>{m.railStartXM.toFixed(2)}–{m.railEndXM.toFixed(2)}<span className="unit">m from nose</span></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <div className="grid gap-8 lg:grid-cols-2">
        <div>
          <h2 className="mb-2 text-lg">Serial units</h2>
          <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid="workshop-units">
            <thead className="text-left text-muted">
              <tr><th className="px-3 py-2">Serial</th><th className="px-3 py-2">Model</th><th className="px-3 py-2">Measured mass</th><th className="px-3 py-2">Measured gross lift</th></tr>
            </thead>
            <tbody>
              {units.map((u) => (
                <tr key={u.id}>
                  <td className={`${cell} figure`}>{u.serial}</td>
                  <td className={cell}>{modelName.get(u.modelId)}</td>
                  <td className={`${cell} figure`}>{(u.measuredMassKg * 1000).toFixed(0)}<span className="unit">g</span></td>
                  <td className={`${cell} figure`}>{(u.measuredGrossLiftKg * 1000).toFixed(0)}<span className="unit">g</span></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <div>
          <h2 className="mb-2 text-lg">Mounts</h2>
          <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid="workshop-mounts">
            <thead className="text-left text-muted">
              <tr><th className="px-3 py-2">Mount</th><th className="px-3 py-2">Thread</th><th className="px-3 py-2">Mass</th><th className="px-3 py-2">Rated load</th></tr>
            </thead>
            <tbody>
              {mounts.map((m) => (
                <tr key={m.id}>
                  <td className={cell}>{m.name}</td>
                  <td className={cell}>{m.thread}</td>
                  <td className={`${cell} figure`}>{(m.massKg * 1000).toFixed(0)}<span className="unit">g</span></td>
                  <td className={`${cell} figure`}>{m.ratedLoadKg.toFixed(1)}<span className="unit">kg</span></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </div>

      <div>
        <h2 className="mb-2 text-lg">Payload templates</h2>
        <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid="workshop-templates">
          <thead className="text-left text-muted">
            <tr><th className="px-3 py-2">Payload</th><th className="px-3 py-2">Category</th><th className="px-3 py-2">Mass</th><th className="px-3 py-2">Attachment</th></tr>
          </thead>
          <tbody>
            {templates.map((t) => (
              <tr key={t.id}>
                <td className={cell}>{t.name}</td>
                <td className={cell}>{t.category}</td>
                <td className={`${cell} figure`}>{(t.massKg * 1000).toFixed(0)}<span className="unit">g</span></td>
                <td className={cell}>{t.attachment}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <div>
        <h2 className="mb-2 text-lg">Accounts and roles</h2>
        <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid="workshop-users">
          <thead className="text-left text-muted">
            <tr><th className="px-3 py-2">Name</th><th className="px-3 py-2">E-mail</th><th className="px-3 py-2">Role</th></tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id}>
                <td className={cell}>{u.name}</td>
                <td className={cell}>{u.email}</td>
                <td className={cell}><RoleSelect userId={u.id} role={u.role} disabled={u.id === viewer.id} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
