/** Asks for a password-reset link by e-mail. The answer is the same whether or not the address has an account. */
export interface PasswordResetRequest {
  email: string;
}

export interface PasswordResetRequested {
  /** Always true: the request was taken (not that an account exists). */
  accepted: true;
  /** How long a link stays usable, in minutes. */
  expiresInMinutes: number;
}

export interface PasswordResetConfirmRequest {
  /** The token from the e-mailed link. */
  token: string;
  password: string;
}
