/**
 * Passwords and password stems that appear near the top of every published breach-frequency list, written
 * out here so the check ships with the app and needs no network (from memory of those lists; lower-case).
 * Policy (lib/auth/password-policy.ts) refuses a password that is one of these, or one of these with only
 * digits and punctuation added or repeated, whatever its case. Passwords under 12 characters are refused
 * by length anyway, so short stems matter only with something appended.
 */
export const COMMON_PASSWORD_STEMS: readonly string[] = [
  'password', 'passw0rd', 'p@ssword', 'p@ssw0rd', 'pass', 'passwort', 'motdepasse', 'contrasena', 'senha', 'parola',
  'qwerty', 'qwertz', 'azerty', 'qwertyuiop', 'qwertyuiopasdfghjkl', 'asdfghjkl', 'asdfgh', 'asdf', 'zxcvbnm', 'zxcvbn',
  '1q2w3e4r', '1q2w3e4r5t', '1q2w3e', 'q1w2e3r4', 'qazwsx', '1qaz2wsx', '1qaz2wsx3edc', 'qwe123', 'zaq12wsx', 'qweasdzxc',
  'abc', 'abcd', 'abcdef', 'abcdefg', 'abcdefgh', 'abcdefghijkl', 'abc123', 'a1b2c3', 'aaaaaa', 'aa123456',
  'letmein', 'welcome', 'welcome1', 'iloveyou', 'loveyou', 'lovely', 'love', 'admin', 'administrator', 'root',
  'login', 'guest', 'user', 'test', 'tester', 'testing', 'default', 'changeme', 'secret', 'master',
  'monkey', 'dragon', 'shadow', 'sunshine', 'princess', 'football', 'baseball', 'basketball', 'soccer', 'hockey',
  'superman', 'batman', 'starwars', 'pokemon', 'naruto', 'michael', 'jennifer', 'jordan', 'hunter', 'buster',
  'charlie', 'daniel', 'thomas', 'robert', 'andrew', 'jessica', 'ashley', 'nicole', 'matthew', 'joshua',
  'freedom', 'whatever', 'trustno1', 'access', 'mustang', 'harley', 'ranger', 'killer', 'george', 'summer',
  'winter', 'spring', 'autumn', 'cheese', 'computer', 'internet', 'service', 'server', 'office', 'company',
  'flower', 'cookie', 'chocolate', 'butterfly', 'purple', 'orange', 'banana', 'pepper', 'ginger', 'tigger',
  'liverpool', 'chelsea', 'arsenal', 'maggie', 'ginger', 'silver', 'golden', 'diamond', 'corvette', 'mercedes',
  'samsung', 'google', 'facebook', 'microsoft', 'apple', 'linkedin', 'twitter', 'yahoo', 'hotmail', 'gmail',
  'baby', 'angel', 'angels', 'family', 'friends', 'forever', 'blessed', 'jesus', 'christ', 'heaven',
  'money', 'million', 'lucky', 'happy', 'smile', 'hello', 'hellothere', 'goodbye', 'thankyou', 'sweet',
  'fuckyou', 'fuckoff', 'asshole', 'bitch', 'sexy', 'pussy', 'hottie', 'babygirl', 'princesa', 'bonjour',
  'truck', 'trucker', 'tow', 'towing', 'towtruck', 'wrecker', 'recovery', 'crane', 'rigging', 'rotator',
  'myspace', 'mypassword', 'yourpassword', 'newpassword', 'oldpassword', 'temp', 'temppassword', 'temporary',
  'correcthorsebatterystaple', 'iloveyouforever', 'letmeinplease', 'passwordpassword', 'qwertyqwerty',
];

/**
 * Whole passwords, already 12 or more characters, that breach lists show often and that the stem rule
 * does not catch (keyboard walks and counting runs).
 */
export const COMMON_LONG_PASSWORDS: readonly string[] = [
  '123456789012', '1234567890123', '12345678901234', '123456789abc', '1234567890qwerty', 'qwerty123456',
  '123456qwerty', 'qwertyuiop123', '1q2w3e4r5t6y', '1q2w3e4r5t6y7u', 'q1w2e3r4t5y6', 'zaq1zaq1zaq1',
  '1qaz2wsx3edc4rfv', 'qazwsxedcrfv', 'qazwsxedc123', 'asdfghjkl123', 'asdfasdfasdf', 'abcd1234abcd',
  'abcdefghijklmnop', 'abcdefg12345', '111111111111', '000000000000', '123123123123', '121212121212',
  '987654321098', '098765432112', 'iloveyou1234', 'password1234', 'password12345', 'password123456',
  'administrator1', 'welcome12345', 'letmein12345', 'changeme1234', 'trustno1trustno1',
];
