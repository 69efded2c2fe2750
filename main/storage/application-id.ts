/**
 * SQLite's `application_id` header field (offset 68) says which program a database file belongs
 * to. Lamina writes this constant into every library it makes (migration 4 adds it to libraries
 * made before), so a file carrying any other id is another program's and is never opened for
 * writing. The schema version stays in `user_version`.
 *
 * The value spells "LMNA" in ASCII; it is our own choice and is not registered anywhere.
 */
export const LAMINA_APPLICATION_ID = 0x4c4d4e41;
