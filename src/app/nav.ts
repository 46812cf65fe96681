import { BookOpen, Flame, FlaskConical, Gauge, House, MessageSquareText, ShieldCheck, Users, type LucideIcon } from 'lucide-react';

export interface NavItem {
  to: string;
  label: string;
  icon: LucideIcon;
  /** Shown to visitors who are not signed in. */
  public?: boolean;
  /** Shown to site admins only (the server refuses everyone else anyway). */
  admin?: true;
}

/** The main navigation; features add their entry here when their pages exist. */
export const navItems: NavItem[] = [
  { to: '/', label: 'Home', icon: House },
  { to: '/recipes', label: 'Recipes', icon: BookOpen },
  { to: '/brews', label: 'Brew days', icon: Flame },
  { to: '/instruments', label: 'Instruments', icon: Gauge },
  { to: '/clubs', label: 'Clubs', icon: Users },
  { to: '/reviews', label: 'Reviews', icon: MessageSquareText },
  { to: '/late-boil-check', label: 'Late-boil check', icon: FlaskConical, public: true },
  { to: '/admin', label: 'Admin', icon: ShieldCheck, admin: true },
];
