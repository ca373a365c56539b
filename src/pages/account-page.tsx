// Your account: change the password, and which mail notices you get.
import { AppHeader } from '../components/app-header';
import { UserMenu } from '../features/auth/components/user-menu';
import { ChangePasswordForm } from '../features/auth/components/change-password-form';
import { NoticeSettingsForm } from '../features/auth/components/notice-settings-form';

export function AccountPage() {
  return (
    <div className="flex min-h-full flex-col">
      <AppHeader screen="Your account" menu={<UserMenu />} />
      <main className="mx-auto flex w-full max-w-2xl flex-col gap-6 px-4 py-6">
        <h1 className="text-2xl font-semibold">Your account</h1>
        <section aria-labelledby="notices-title" className="flex flex-col gap-2">
          <h2 id="notices-title" className="text-lg font-semibold">
            Mail notices
          </h2>
          <p className="text-sm text-ink-soft">Invitations and password links always come; these you can turn off.</p>
          <NoticeSettingsForm />
        </section>
        <section aria-labelledby="password-title" className="flex flex-col gap-2">
          <h2 id="password-title" className="text-lg font-semibold">
            Password
          </h2>
          <ChangePasswordForm />
        </section>
      </main>
    </div>
  );
}

export default AccountPage;
