/**
 * Passwords of 12 characters or more that are too easy to guess. OWASP ASVS 2.1.7 and NIST SP
 * 800-63B §5.1.1.2 ask for a check against commonly used passwords instead of composition
 * rules. The list is short and typed by hand (common practice: the long passwords that lead
 * breach lists, from memory); the patterns below catch their many variants.
 */
const COMMON: readonly string[] = [
  "password1234", "password12345", "password123456", "passwordpassword", "123456789012", "1234567890123", "12345678901234",
  "qwertyuiop12", "qwertyuiop123", "qwertyuiopasdf", "qwerty123456", "qwerty12345678", "1q2w3e4r5t6y", "1qaz2wsx3edc",
  "zaq12wsxcde3", "asdfghjkl123", "asdfghjklzxc", "iloveyou1234", "iloveyouiloveyou", "administrator", "administrator1",
  "letmein12345", "welcome12345", "welcome123456", "changeme1234", "trustno11234", "sunshine1234", "football1234",
  "baseball1234", "princess1234", "superman1234", "starwars1234", "monkey123456", "dragon123456", "michael12345",
  "abcdefghijkl", "abcdefgh1234", "abcd12345678", "aaaaaaaaaaaa", "111111111111", "000000000000", "123123123123",
  "abc123abc123", "passw0rd1234", "p@ssw0rd1234", "p@ssword1234", "mypassword123", "secretpassword", "thisismypassword",
  "correcthorsebatterystaple", "hushmark1234", "hushmark12345", "soundproofing", "soundproofing1",
];
const COMMON_SET = new Set(COMMON);

const SEQUENCES = ["0123456789", "abcdefghijklmnopqrstuvwxyz", "qwertyuiopasdfghjklzxcvbnm", "1qaz2wsx3edc4rfv5tgb"];

/** True when a password is on the list, one repeated character or chunk, or a run of a keyboard or alphabet sequence. */
export function isWeakPassword(password: string): boolean {
  const p = password.toLowerCase().replace(/\s+/g, "");
  if (COMMON_SET.has(p)) return true;
  if (/^(.+?)\1+$/.test(p)) return true;
  // Runs may wrap around (…7890123…) and go either way.
  if (SEQUENCES.some((seq) => (seq + seq).includes(p) || [...(seq + seq)].reverse().join("").includes(p))) return true;
  // "password" or the product's name with only digits and symbols around it.
  const core = p.replace(/@/g, "a").replace(/\$/g, "s").replace(/[^a-z]/g, "");
  if (["password", "passw", "hushmark", "qwerty", "letmein", "welcome", "admin", "iloveyou"].includes(core) && core.length <= p.length) return true;
  return false;
}
