/**
 * A post-processor definition: the settings of one controller dialect, validated by zod.
 * The post's handlebars templates hold the program's shape; this file holds what varies
 * between controls of one family (variables, formats, codes), so a shop changes a
 * setting rather than forking a template.
 */
import { z } from 'zod';

const lines = z.array(z.string().max(200)).max(40);
const word = z.string().regex(/^[A-Z]$/);

export const postDefinitionSchema = z.object({
  id: z.string().regex(/^[a-z0-9-]{2,40}$/),
  name: z.string().min(1).max(80),
  description: z.string().max(400),
  fileExtension: z.string().regex(/^[a-z0-9]{1,8}$/),
  decimals: z.object({ linear: z.number().int().min(2).max(6), angular: z.number().int().min(2).max(6), feed: z.number().int().min(0).max(3) }),
  lineNumbers: z.object({ enabled: z.boolean(), start: z.number().int().positive(), step: z.number().int().positive(), letter: word }),
  comments: z.object({
    open: z.string().min(1).max(2),
    close: z.string().max(2),
    maxLength: z.number().int().min(20).max(250),
    uppercase: z.boolean(),
  }),
  /** Lines before everything (e.g. "%" and a program number) and after the program end. */
  programStart: lines,
  programEnd: lines,
  /** Modal set-up line(s): units mm, absolute, cutter compensation off, plane, work offset. */
  safeStart: lines,
  probeOn: lines,
  probeOff: lines,
  /** Emit the feed word on every feed move (true) or only when it changes (false). */
  repeatFeed: z.boolean(),
  trip: z.object({
    /** System variables holding the trip position, per axis word. */
    variables: z.record(z.string().regex(/^[XYZABC]$/), z.string().regex(/^#\d{1,5}$/)),
    /** Statements opening and closing the result output. `{program}` = part number. */
    open: lines,
    close: lines,
    /** The record statement; `{uuid}` and `{values}` are filled in. */
    record: z.string().includes('{uuid}').includes('{values}'),
    /** One axis value inside the record; `{word}`, `{var}` are filled in. */
    value: z.string().includes('{word}').includes('{var}'),
    /** Between values (and between `TRIP`, the uuid and the values in output). */
    separator: z.string().max(3),
    uuidCase: z.enum(['lower', 'upper']),
  }),
  /** Statements that stop the program with a message: on a touch that did not trigger, on a protected move that did. */
  stops: z.object({ miss: lines, hit: lines }),
  /** Tolerance (mm) when a skip position is compared with a programmed end point. */
  skipTolerance: z.number().positive().max(0.1),
  /** Words and codes the post writes (and so the verifier accepts), beyond axis words and F/N. */
  knownCodes: z.array(z.string().max(12)).max(80),
});
export type PostDefinition = z.infer<typeof postDefinitionSchema>;
