import bcrypt from "bcryptjs";

// bcrypt cost: 10 in production; tests lower it through BCRYPT_ROUNDS to keep suites quick.
const rounds = Math.max(4, Math.min(14, Number(process.env.BCRYPT_ROUNDS) || 10));

export const hashPassword = (plain: string) => bcrypt.hash(plain, rounds);
export const verifyPassword = (plain: string, hash: string) => bcrypt.compare(plain, hash);

// Compared against when the e-mail is unknown, so a miss costs the same time as a wrong password.
const decoy = bcrypt.hashSync("decoy-password-never-valid", rounds);
export const burnPasswordCheck = (plain: string) => bcrypt.compare(plain, decoy);
