export const peopleKeys = {
  users: ["people", "users"] as const,
  invitations: ["people", "invitations"] as const,
};
