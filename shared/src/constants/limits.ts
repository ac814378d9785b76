/** Product limits shared by the schemas, the API and the screens. */

/** Longest trip Gramwatt plans, in nights (product brief: "a few nights up to 60 nights"). */
export const maxTripNights = 60;

/** Shortest accepted password, in characters (foundation issue: "a password of at least 10 characters"). */
export const minPasswordLength = 10;

/** Longest accepted password, in characters: bounds the argon2 work an attacker can ask for. */
export const maxPasswordLength = 256;
