// heic-decode ships no types; this is the part of its API the upload route uses.
declare module "heic-decode" {
  type Decoded = { width: number; height: number; data: Uint8ClampedArray };
  type Parsed = Array<{ width: number; height: number; decode: () => Promise<Decoded> }> & { dispose: () => void };
  function decode(input: { buffer: Uint8Array | ArrayBuffer }): Promise<Decoded>;
  namespace decode {
    function all(input: { buffer: Uint8Array | ArrayBuffer }): Promise<Parsed>;
  }
  export default decode;
}
