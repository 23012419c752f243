import type { Role } from "@/lib/roles";

export interface Account {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  active: boolean;
  lastSignInAt: string | null;
  createdAt: string;
}

export type InvitationState = "open" | "used" | "expired" | "revoked";

export interface Invitation {
  id: number;
  email: string;
  role: Role;
  state: InvitationState;
  createdAt: string;
  expiresAt: string;
  invitedBy: { id: number; displayName: string } | null;
}
