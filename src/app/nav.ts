import { BookOpen, FlaskConical, Gauge, House, Users, type LucideIcon } from 'lucide-react';

export interface NavItem {
  to: string;
  label: string;
  icon: LucideIcon;
  /** Shown to visitors who are not signed in. */
  public?: boolean;
}

/** The main navigation; features add their entry here when their pages exist. */
export const navItems: NavItem[] = [
  { to: '/', label: 'Home', icon: House },
];

// Icons reserved for the recipe, instrument, brew-day and club pages.
export const featureIcons = { BookOpen, FlaskConical, Gauge, Users };
