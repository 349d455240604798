import { listUsersPage } from "@/db/queries/users";
import { Pager } from "@/components/workshop/pager";
import { RoleSelect } from "@/components/workshop/role-select";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { pageQuerySchema, WORKSHOP_PAGE_SIZE } from "@/lib/catalogue/schemas";
import { MAKER_ONLY } from "@/lib/domain";
import { WorkshopTable } from "@/components/workshop/workshop-table";

export const metadata = { title: "Workshop: people" };

const cell = "border-t border-hairline px-3 py-2";

export default async function WorkshopPeoplePage({ searchParams }: PageProps<"/workshop/people">) {
  const viewer = await requirePageViewer(MAKER_ONLY, "/workshop/people");
  const { page } = pageQuerySchema.catch({ page: 1 }).parse(await searchParams);
  const list = await listUsersPage({ page, pageSize: WORKSHOP_PAGE_SIZE });
  return (
    <section className="space-y-4">
      <WorkshopNav
        current="people"
        title="People"
        intro="Who may do what. A role changes only when you confirm it; your own account keeps the maker role."
      />
      <WorkshopTable testId="workshop-users">
        <thead className="text-left text-muted">
          <tr>
            <th className="px-3 py-2">Name</th>
            <th className="px-3 py-2">E-mail</th>
            <th className="px-3 py-2">Role</th>
          </tr>
        </thead>
        <tbody>
          {list.rows.map((u) => (
            <tr key={u.id}>
              <td className={cell}>{u.name}</td>
              <td className={cell}>{u.email}</td>
              <td className={cell}>
                <RoleSelect userId={u.id} name={u.name} role={u.role} disabled={u.id === viewer.id} />
              </td>
            </tr>
          ))}
        </tbody>
      </WorkshopTable>
      <Pager basePath="/workshop/people" page={list.page} pageSize={list.pageSize} total={list.total} />
    </section>
  );
}
