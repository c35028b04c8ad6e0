export const say = (msg: string) => console.log(`[crankwise] ${msg}`);
export const fail = (msg: string): never => {
  console.error(`[crankwise] ${msg}`);
  process.exit(1);
};
