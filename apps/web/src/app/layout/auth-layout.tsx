import { Outlet } from 'react-router-dom';
import { Brand } from './brand';

/** Pages for people who are not (yet) inside an organisation: a centred card under the product name. */
export function AuthLayout() {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 py-12">
      <div className="mb-8 text-lg">
        <Brand />
      </div>
      <main className="w-full max-w-md">
        <Outlet />
      </main>
    </div>
  );
}
