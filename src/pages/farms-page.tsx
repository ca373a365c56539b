// Farms: the farms this user belongs to.
import { AppHeader } from '../components/app-header';
import { UserMenu } from '../features/auth/components/user-menu';
import { ClientBoardLink } from '../features/board/components/client-board-link';
import { FarmList } from '../features/farms/components/farm-list';

export function FarmsPage() {
  return (
    <div className="flex min-h-full flex-col">
      <AppHeader screen="Farms" menu={<UserMenu />} />
      <main className="mx-auto flex w-full max-w-2xl flex-col gap-4 px-4 py-6">
        <h1 className="text-2xl font-semibold">Your farms</h1>
        <FarmList />
        <ClientBoardLink />
      </main>
    </div>
  );
}
