// The next Float32 value above x (IEEE 754 nextafter toward +∞), used as the ε of
// Priority-Flood+ε so filled flats keep a strict downhill gradient in Float32 storage.
const f32 = new Float32Array(1);
const i32 = new Int32Array(f32.buffer);

/** Smallest Float32 greater than x (x finite). */
export function float32NextUp(x: number): number {
  f32[0] = x;
  const v = f32[0];
  if (v === 0) return 1.401298464324817e-45; // smallest positive subnormal
  if (v > 0) i32[0] += 1;
  else i32[0] -= 1;
  return f32[0];
}
