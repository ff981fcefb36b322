// libzip's functions, loaded when the first workbook is opened rather than at every start:
// libzip brings libcrypto, libz and libbz2, whose loading and relocation cost more than a
// whole check of a small calc file (issue 12).
#pragma once

#include <zip.h>

namespace plumb::sheets {

struct zip_functions {
    decltype(&::zip_discard) discard;
    decltype(&::zip_error_code_zip) error_code_zip;
    decltype(&::zip_error_fini) error_fini;
    decltype(&::zip_error_init) error_init;
    decltype(&::zip_fclose) fclose;
    decltype(&::zip_fopen_index) fopen_index;
    decltype(&::zip_fread) fread;
    decltype(&::zip_get_num_entries) get_num_entries;
    decltype(&::zip_name_locate) name_locate;
    decltype(&::zip_open_from_source) open_from_source;
    decltype(&::zip_source_buffer_create) source_buffer_create;
    decltype(&::zip_source_free) source_free;
    decltype(&::zip_stat_index) stat_index;
    decltype(&::zip_stat_init) stat_init;
};

// The loaded library. Throws workbook_error when it cannot be loaded, so that the workbook is
// reported as unreadable and the other files are still checked.
const zip_functions& zip_library();

} // namespace plumb::sheets
