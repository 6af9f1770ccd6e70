import { v7 } from 'uuid';

/**
 * The id of a record or operation made on the tablet: a UUIDv7 (RFC 9562), whose leading
 * timestamp makes ids made later sort later. The server's key indexes then grow at one end, so a
 * pushed batch touches a few index pages instead of one per record; random (v4) ids scattered
 * each batch across the whole index, and the commit cost grew with the table.
 */
export const recordId = (): string => v7();
