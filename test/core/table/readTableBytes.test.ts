import { describe, expect, it } from "vitest";
import { readTableBytes, type ByteSource } from "../../../src/core/table/readTableBytes.ts";

const utf8 = () => {
  const decoder = new TextDecoder("utf-8", { fatal: true });
  return (bytes: Uint8Array, last: boolean) => decoder.decode(bytes, { stream: !last });
};

describe("readTableBytes: a failing read", () => {
  it("a read that fails after the first chunk is reported as a read failure with its cause, not as invalid utf-8", async () => {
    const bytes = new TextEncoder().encode("x,y\n1,2\n3,4\n5,6\n");
    let calls = 0;
    const source: ByteSource = {
      size: bytes.length,
      read: async (start, end) => {
        // the first call is the encoding probe, the second the first chunk; the third fails
        if (++calls === 3) throw new Error("EIO: i/o error, read");
        return bytes.subarray(start, end);
      },
    };
    const error = await readTableBytes(source, {}, { utf8, chunkBytes: 8 }).catch((e: unknown) => e as Error);
    expect(error).toBeInstanceOf(Error);
    expect((error as Error).message).toBe("cannot read the file at bytes 8 to 16: EIO: i/o error, read"); // chunks of 8 bytes: the second is [8, 16)
  });

  it("a byte that is not utf-8 still names the encoding and the byte (near byte 0)", async () => {
    const bytes = new Uint8Array([0x78, 0x0a, 0xff, 0x0a]);
    const source: ByteSource = { size: bytes.length, read: async (start, end) => bytes.subarray(start, end) };
    await expect(readTableBytes(source, { encoding: "utf-8" }, { utf8 })).rejects.toThrow("the file is not valid utf-8 near byte 0"); // one chunk starting at byte 0
  });
});
