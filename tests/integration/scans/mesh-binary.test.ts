import { describe, expect, it } from "vitest";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeObj } from "@/lib/geometry/intake/write-mesh";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { decodeHeatmap, decodeIntake, decodeViewerMesh, encodeHeatmap, encodeIntake, encodeViewerMesh } from "@/lib/scans/mesh-binary";

/** The stored mesh files: sizes from their layout, lossless intake copy, Float32 viewer copy, misaligned reads. */
describe("scan mesh files", () => {
  it("round-trips the intake copy bit for bit and the viewer copy within Float32 precision", async () => {
    const sphere = uvSphere({ radius: 37.3, latitudeBands: 12, longitudeSegments: 20 });
    const intake = await readMesh(new TextEncoder().encode(writeObj(sphere)), { units: "mm" });
    const v = intake.mesh.positions.length / 3, f = intake.mesh.triangles.length / 3;

    const copy = encodeIntake(intake);
    // layout: 24-byte header, 24 bytes per vertex (3 × Float64), 12 per face, 4 per input vertex
    expect(copy.byteLength).toBe(24 + 24 * v + 12 * f + 4 * intake.inputToWorking.length);
    // read from an odd offset, as a Buffer slice of a larger download may be
    const shifted = new Uint8Array(copy.byteLength + 1);
    shifted.set(copy, 1);
    const back = decodeIntake(shifted.subarray(1));
    expect(back.mesh.positions).toEqual(intake.mesh.positions);
    expect(back.mesh.triangles).toEqual(intake.mesh.triangles);
    expect(back.inputToWorking).toEqual(intake.inputToWorking);

    const viewer = encodeViewerMesh(intake.mesh);
    expect(viewer.byteLength).toBe(16 + 12 * v + 12 * f);
    const seen = decodeViewerMesh(viewer);
    expect(seen.triangles).toEqual(intake.mesh.triangles);
    // Source: IEEE 754 binary32 has a 24-bit significand, so rounding is within 2^-24 relative
    for (let i = 0; i < seen.positions.length; i++) {
      expect(Math.abs(seen.positions[i] - intake.mesh.positions[i])).toBeLessThanOrEqual(Math.abs(intake.mesh.positions[i]) * 2 ** -24);
    }
  });

  it("round-trips a piece heat map and refuses files that are not what they claim", () => {
    const h = {
      uv: new Float64Array([0, 0, 10, 0, 0, 10, 10, 10]),
      triangles: new Uint32Array([0, 1, 2, 1, 3, 2]),
      s1: new Float64Array([1.25, 1]),
      s2: new Float64Array([0.5, 1]),
      faces: new Uint32Array([7, 9]),
    };
    const bytes = encodeHeatmap(h);
    expect(bytes.byteLength).toBe(16 + 8 * 4 + 24 * 2);
    expect(decodeHeatmap(bytes)).toEqual(h);
    expect(() => decodeHeatmap(bytes.subarray(0, bytes.byteLength - 4))).toThrow(/do not match its counts/);
    expect(() => decodeViewerMesh(bytes)).toThrow(/not a PFMESH1 file/);
    expect(() => decodeIntake(new Uint8Array(8))).toThrow(/too short/);
  });
});
