/**
 * Deterministic touch-point UUIDs: RFC 9562 version 5 (SHA-1, name-based) of the feature
 * uuid, the feature's canonical geometry (itself named by a v5 uuid, so the hashed name
 * stays short) and the point's index in the feature, in a namespace of Probity's own. The same three always give the same uuid, so revisions of
 * a program can be compared point by point.
 */
import { parse, v5 } from 'uuid';

/** Probity's namespace for touch points (a random version-4 uuid drawn once for this project). */
export const TOUCH_POINT_NAMESPACE = '45dd1cb9-7083-4dfc-8fd2-54fe6f5fed68';

// Parsed once and encoded natively (the same bytes uuid derives from the strings, faster).
const NAMESPACE_BYTES = parse(TOUCH_POINT_NAMESPACE);
const utf8 = new TextEncoder();

/** The name of a feature's geometry: a v5 uuid of its canonical text (computed once per feature). */
export const geometryName = (geometryKey: string): string => v5(utf8.encode(geometryKey), NAMESPACE_BYTES);

/** The touch point's uuid from its feature uuid, the feature's `geometryName` and the point index. */
export const touchPointUuid = (featureUuid: string, geometry: string, index: number): string =>
  v5(utf8.encode(`${featureUuid.toLowerCase()}|${geometry}|${index}`), NAMESPACE_BYTES);
