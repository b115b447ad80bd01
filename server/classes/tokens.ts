import "server-only";
import { randomInt } from "node:crypto";

// Letters and digits that cannot be mistaken for one another when read aloud in class.
const ALPHABET = "ABCDEFGHJKLMNPQRSTUVWXYZ23456789";

/** An 8-character join code (32⁸ ≈ 10¹²: not guessable by trying). */
export function newJoinCode(): string {
  let code = "";
  for (let i = 0; i < 8; i++) code += ALPHABET[randomInt(ALPHABET.length)];
  return code;
}

export { hashShareToken as hashToken, newShareToken as newToken } from "@/server/reviews/tokens";
