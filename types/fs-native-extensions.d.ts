// fs-native-extensions ships no type declarations; only the calls server/db/lock.ts makes.
declare module "fs-native-extensions" {
  /** An exclusive (or shared) lock on the open file `fd`, without waiting: false when another holder has it. */
  export function tryLock(fd: number, offset?: number, length?: number, opts?: { shared?: boolean }): boolean;
  export function unlock(fd: number, offset?: number, length?: number): void;
}
