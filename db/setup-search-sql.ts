// The queue's name search: an FTS5 index of setup names with the trigram tokenizer, so a substring
// of three or more characters is found from the index instead of by reading every setup. It keeps
// no copy of the names (contentless); the queue still checks its LIKE against the setup row, so the
// index only narrows which rows are read and the matches stay exactly LIKE's.

export const SETUP_NAME_SEARCH = "setup_name_search";
/** Trigrams: a shorter search cannot use the index. */
export const SEARCH_MIN_CHARS = 3;

const keyOf = (ref: string) => `(select key from setup_search_keys where setup_id = ${ref}.id)`;

export function setupSearchTable(): string[] {
  return [
    `drop table if exists ${SETUP_NAME_SEARCH};`,
    `create virtual table ${SETUP_NAME_SEARCH} using fts5(name, content = '', contentless_delete = 1, tokenize = 'trigram');`,
  ];
}

export function setupSearchTriggers(): string[] {
  const add = (ref: string) =>
    `insert into ${SETUP_NAME_SEARCH} (rowid, name) select key, ${ref}.name from setup_search_keys where setup_id = ${ref}.id;`;
  const remove = (ref: string) => `delete from ${SETUP_NAME_SEARCH} where rowid = ${keyOf(ref)};`;
  return [
    `create trigger derived_search_setup_insert after insert on setups\nbegin\ninsert into setup_search_keys (setup_id) values (new.id);\n${add("new")}\nend;`,
    `create trigger derived_search_setup_rename after update of name on setups when old.name is not new.name\nbegin\n${remove("old")}\n${add("new")}\nend;`,
    `create trigger derived_search_setup_delete before delete on setups\nbegin\n${remove("old")}\ndelete from setup_search_keys where setup_id = old.id;\nend;`,
  ];
}

export function setupSearchBackfill(): string[] {
  return [
    "delete from setup_search_keys;",
    "insert into setup_search_keys (setup_id) select id from setups order by id;",
    `insert into ${SETUP_NAME_SEARCH} (rowid, name) select k.key, s.name from setup_search_keys k join setups s on s.id = k.setup_id;`,
  ];
}
