import { redirect } from 'next/navigation';
import { getCurrentSession } from '@/lib/auth/current-session';

export default async function IndexPage() {
  const { user } = await getCurrentSession();
  redirect(user ? '/home' : '/sign-in');
}
