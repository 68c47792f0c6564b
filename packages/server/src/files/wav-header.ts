/** Reading a WAV (RIFF/WAVE) header without loading the file: enough to stream its samples. */

export interface WavFormat {
  encoding: "pcm" | "float";
  channels: number;
  sampleRateHz: number;
  bitsPerSample: number;
  /** Bytes per frame (all channels). */
  blockAlign: number;
  /** Byte offset of the first sample. */
  dataOffset: number;
  /** Bytes of sample data (clipped to the file when the header claims more). */
  dataBytes: number;
  durationS: number;
}

export class WavFormatError extends Error {}

const EXTENSIBLE = 0xfffe;

/**
 * Parses the header from the first bytes of a file (`head`, at least up to the data chunk's start)
 * and the file's full size. Accepts 16/24/32-bit integer PCM and 32/64-bit float, any channel count
 * and a sample rate of 8–192 kHz.
 */
export function readWavHeader(head: Buffer, fileBytes: number): WavFormat {
  if (head.length < 12 || head.toString("ascii", 0, 4) !== "RIFF" || head.toString("ascii", 8, 12) !== "WAVE") {
    throw new WavFormatError("The file does not start like a WAV file (RIFF/WAVE).");
  }
  let offset = 12;
  let fmt: Omit<WavFormat, "dataOffset" | "dataBytes" | "durationS"> | null = null;
  while (offset + 8 <= head.length) {
    const id = head.toString("ascii", offset, offset + 4);
    const size = head.readUInt32LE(offset + 4);
    const body = offset + 8;
    if (id === "fmt ") {
      if (body + 16 > head.length) break;
      let tag = head.readUInt16LE(body);
      const channels = head.readUInt16LE(body + 2);
      const sampleRateHz = head.readUInt32LE(body + 4);
      const blockAlign = head.readUInt16LE(body + 12);
      const bitsPerSample = head.readUInt16LE(body + 14);
      if (tag === EXTENSIBLE && size >= 40 && body + 26 <= head.length) tag = head.readUInt16LE(body + 24);
      if (tag !== 1 && tag !== 3) throw new WavFormatError("The WAV file is compressed; export it as uncompressed PCM (16 or 24 bit) or 32-bit float.");
      const encoding = tag === 3 ? "float" : "pcm";
      const okBits = encoding === "float" ? [32, 64] : [16, 24, 32];
      if (!okBits.includes(bitsPerSample)) throw new WavFormatError(`${bitsPerSample}-bit ${encoding === "float" ? "float" : "PCM"} samples are not supported; use 16 or 24-bit PCM or 32-bit float.`);
      if (channels < 1 || channels > 8) throw new WavFormatError(`A WAV file with ${channels} channels is not supported (1–8).`);
      if (sampleRateHz < 8000 || sampleRateHz > 192_000) throw new WavFormatError(`The sample rate ${sampleRateHz} Hz is outside 8–192 kHz.`);
      if (blockAlign !== (channels * bitsPerSample) / 8) throw new WavFormatError("The WAV header's frame size does not match its channels and bit depth.");
      fmt = { encoding, channels, sampleRateHz, bitsPerSample, blockAlign };
    } else if (id === "data") {
      if (!fmt) throw new WavFormatError("The WAV file has no format chunk before its samples.");
      const available = Math.max(0, fileBytes - body);
      // Recorders that never finished writing leave 0 or 0xFFFFFFFF here; the file's size is the truth.
      const claimed = size === 0 || size === 0xffffffff ? available : Math.min(size, available);
      const dataBytes = claimed - (claimed % fmt.blockAlign);
      if (dataBytes === 0) throw new WavFormatError("The WAV file holds no samples.");
      return { ...fmt, dataOffset: body, dataBytes, durationS: dataBytes / fmt.blockAlign / fmt.sampleRateHz };
    }
    offset = body + size + (size % 2);
  }
  throw new WavFormatError(fmt ? "The WAV file's sample data could not be found near its start." : "The WAV file has no format chunk.");
}

/** Turns byte chunks of interleaved samples into mono blocks (channel mean, full scale ±1). */
export class WavSampleDecoder {
  private carry: Buffer = Buffer.alloc(0);
  constructor(private readonly format: WavFormat) {}

  decode(chunk: Buffer): Float64Array {
    const data = this.carry.length ? Buffer.concat([this.carry, chunk]) : chunk;
    const { blockAlign, channels, bitsPerSample, encoding } = this.format;
    const frames = Math.floor(data.length / blockAlign);
    this.carry = Buffer.from(data.subarray(frames * blockAlign));
    const out = new Float64Array(frames);
    const bytes = bitsPerSample / 8;
    const read =
      encoding === "float"
        ? bytes === 4 ? (o: number) => data.readFloatLE(o) : (o: number) => data.readDoubleLE(o)
        : bytes === 2 ? (o: number) => data.readInt16LE(o) / 32768
        : bytes === 3 ? (o: number) => data.readIntLE(o, 3) / 8388608
        : (o: number) => data.readInt32LE(o) / 2147483648;
    for (let f = 0; f < frames; f++) {
      let sum = 0;
      const base = f * blockAlign;
      for (let c = 0; c < channels; c++) sum += read(base + c * bytes);
      out[f] = sum / channels;
    }
    return out;
  }
}

/** A 44-byte header for a PCM excerpt copied from a file of the given format. */
export function wavHeaderFor(format: WavFormat, dataBytes: number): Buffer {
  const h = Buffer.alloc(44);
  h.write("RIFF", 0, "ascii");
  h.writeUInt32LE(36 + dataBytes, 4);
  h.write("WAVE", 8, "ascii");
  h.write("fmt ", 12, "ascii");
  h.writeUInt32LE(16, 16);
  h.writeUInt16LE(format.encoding === "float" ? 3 : 1, 20);
  h.writeUInt16LE(format.channels, 22);
  h.writeUInt32LE(format.sampleRateHz, 24);
  h.writeUInt32LE(format.sampleRateHz * format.blockAlign, 28);
  h.writeUInt16LE(format.blockAlign, 32);
  h.writeUInt16LE(format.bitsPerSample, 34);
  h.write("data", 36, "ascii");
  h.writeUInt32LE(dataBytes, 40);
  return h;
}
