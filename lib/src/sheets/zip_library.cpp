// Loads libzip by the soname the build was configured against, once per process.
#include "sheets/zip_library.hpp"

#include "plumb/check.hpp"
#include "sheets/workbook.hpp"

#include <dlfcn.h>
#include <fmt/format.h>
#include <string>

#ifndef PLUMB_LIBZIP_SONAME
#error "PLUMB_LIBZIP_SONAME names the libzip to load (set by lib/CMakeLists.txt)"
#endif

namespace plumb::sheets {
namespace {

struct loaded_library {
    zip_functions functions{};
    std::string failure; // empty when every function was found
};

template <typename Function>
void resolve(void* library, const char* name, Function& out, std::string& failure) {
    void* address = dlsym(library, name);
    if (address == nullptr && failure.empty())
        failure = fmt::format("{} lacks the function {}", PLUMB_LIBZIP_SONAME, name);
    // POSIX guarantees that a function's address survives the trip through void*.
    out =
        reinterpret_cast<Function>(address); // NOLINT(cppcoreguidelines-pro-type-reinterpret-cast)
}

loaded_library load() {
    loaded_library result;
    void* library = dlopen(PLUMB_LIBZIP_SONAME, RTLD_NOW | RTLD_LOCAL);
    if (library == nullptr) {
        const char* why = dlerror();
        result.failure = fmt::format("workbooks need {} (Debian package libzip), which cannot "
                                     "be loaded: {}",
                                     PLUMB_LIBZIP_SONAME, why != nullptr ? why : "not found");
        return result;
    }
    zip_functions& f = result.functions;
    std::string& failure = result.failure;
    resolve(library, "zip_discard", f.discard, failure);
    resolve(library, "zip_error_code_zip", f.error_code_zip, failure);
    resolve(library, "zip_error_fini", f.error_fini, failure);
    resolve(library, "zip_error_init", f.error_init, failure);
    resolve(library, "zip_fclose", f.fclose, failure);
    resolve(library, "zip_fopen_index", f.fopen_index, failure);
    resolve(library, "zip_fread", f.fread, failure);
    resolve(library, "zip_get_num_entries", f.get_num_entries, failure);
    resolve(library, "zip_name_locate", f.name_locate, failure);
    resolve(library, "zip_open_from_source", f.open_from_source, failure);
    resolve(library, "zip_source_buffer_create", f.source_buffer_create, failure);
    resolve(library, "zip_source_free", f.source_free, failure);
    resolve(library, "zip_stat_index", f.stat_index, failure);
    resolve(library, "zip_stat_init", f.stat_init, failure);
    return result; // the library stays loaded for the life of the process
}

// Set by a statically linked plumb, which must not load libzip itself (plumb/check.hpp).
workbook_handover& handover_hook() {
    static workbook_handover hook = nullptr;
    return hook;
}

} // namespace

const zip_functions& zip_library() {
    if (workbook_handover hook = handover_hook()) {
        std::string why;
        hook(why); // returns only when the handover failed
        throw workbook_error(why);
    }
    static const loaded_library library = load();
    if (!library.failure.empty())
        throw workbook_error(library.failure);
    return library.functions;
}

} // namespace plumb::sheets

namespace plumb {

void set_workbook_handover(workbook_handover handover) {
    sheets::handover_hook() = handover;
}

} // namespace plumb
