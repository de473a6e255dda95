/**
 * The bytes in an ArrayBuffer of their own, which can be transferred to another thread: a Buffer may be a view into
 * a shared pool of Node's, and moving that would take its neighbours' bytes too. Copies only when it must.
 */
export function ownArrayBuffer(bytes: Uint8Array): ArrayBuffer {
  if (bytes.byteOffset === 0 && bytes.byteLength === bytes.buffer.byteLength && bytes.buffer instanceof ArrayBuffer) return bytes.buffer;
  return new Uint8Array(bytes).buffer;
}
