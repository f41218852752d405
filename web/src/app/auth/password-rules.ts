// The password length the API accepts (contract of issue 3): 10 characters is the floor; 200 caps
// the work argon2 does per attempt.
export const passwordMin = 10;
export const passwordMax = 200;
