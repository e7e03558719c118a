/** "No installs", "1 install", "4 installs". */
export const installsWords = (n: number) => (n === 0 ? "No installs" : `${n} install${n === 1 ? "" : "s"}`);
