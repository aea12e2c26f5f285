/** Small stroke icons drawn for Probity (24-unit grid, currentColor). */
import type { ReactNode, SVGProps } from 'react';

type IconProps = SVGProps<SVGSVGElement> & { title?: string };

function Svg({ title, children, ...rest }: IconProps & { children: ReactNode }) {
  return (
    <svg viewBox="0 0 24 24" width={18} height={18} fill="none" stroke="currentColor" strokeWidth={1.8}
      strokeLinecap="round" strokeLinejoin="round" aria-hidden={title ? undefined : true} role={title ? 'img' : undefined} {...rest}>
      {title ? <title>{title}</title> : null}
      {children}
    </svg>
  );
}

export const CheckCircleIcon = (p: IconProps) => <Svg {...p}><circle cx="12" cy="12" r="9" /><path d="m8 12.5 2.7 2.7L16.5 9.5" /></Svg>;
export const TriangleIcon = (p: IconProps) => <Svg {...p}><path d="M12 3.5 21.5 20h-19z" /><path d="M12 10v4.5M12 17.3v.2" /></Svg>;
export const OctagonCrossIcon = (p: IconProps) => <Svg {...p}><path d="M8.3 3h7.4L21 8.3v7.4L15.7 21H8.3L3 15.7V8.3z" /><path d="m9 9 6 6M15 9l-6 6" /></Svg>;
export const DashCircleIcon = (p: IconProps) => <Svg {...p}><circle cx="12" cy="12" r="9" /><path d="M8 12h8" /></Svg>;

export const PartIcon = (p: IconProps) => <Svg {...p}><path d="M4 8 12 4l8 4v8l-8 4-8-4z" /><path d="m4 8 8 4 8-4M12 12v8" /></Svg>;
export const MachineIcon = (p: IconProps) => <Svg {...p}><rect x="3" y="14" width="18" height="6" rx="1" /><path d="M7 14V6h6v4M13 6h3v5" /><circle cx="16" cy="12.5" r="1" /></Svg>;
export const ProbeIcon = (p: IconProps) => <Svg {...p}><path d="M10 3h4v6h-4zM12 9v8" /><circle cx="12" cy="19" r="2" /></Svg>;
export const ProgramIcon = (p: IconProps) => <Svg {...p}><rect x="4" y="3" width="16" height="18" rx="2" /><path d="M8 8h8M8 12h5M8 16h6" /></Svg>;
export const RunIcon = (p: IconProps) => <Svg {...p}><path d="M4 19V5M4 19h16" /><path d="m7 15 4-4 3 3 5-6" /></Svg>;
export const ReviewIcon = (p: IconProps) => <Svg {...p}><path d="M4 5h16v11H9l-5 4z" /><path d="m9 10.5 2 2 4-4" /></Svg>;
export const AdminIcon = (p: IconProps) => <Svg {...p}><circle cx="9" cy="8" r="3.2" /><path d="M3.5 19a5.5 5.5 0 0 1 11 0M16 6.5a3 3 0 0 1 0 5.8M17.5 19a5 5 0 0 0-2.2-4.2" /></Svg>;
export const MenuIcon = (p: IconProps) => <Svg {...p}><path d="M4 7h16M4 12h16M4 17h16" /></Svg>;
export const LockIcon = (p: IconProps) => <Svg {...p}><rect x="5" y="10.5" width="14" height="10" rx="2" /><path d="M8 10.5V7.5a4 4 0 0 1 8 0v3" /></Svg>;
