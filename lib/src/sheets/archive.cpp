// libzip from a memory buffer: no temporary file, nothing written, every size checked as it
// is read rather than trusted from the archive's own headers.
#include "sheets/archive.hpp"

#include "sheets/zip_library.hpp"

#include <fmt/format.h>

namespace plumb::sheets {

struct archive::handle {
    zip_t* zip = nullptr;
    ~handle() {
        if (zip != nullptr)
            zip_library().discard(zip); // read-only: nothing to write back
    }
};

archive::archive(std::string_view bytes, const read_limits& limits)
    : zip_(std::make_unique<handle>()), limits_(limits) {
    zip_error_t error;
    zip_library().error_init(&error);
    zip_source_t* source =
        zip_library().source_buffer_create(bytes.data(), bytes.size(), 0, &error);
    if (source == nullptr) {
        zip_library().error_fini(&error);
        throw workbook_error("out of memory while opening the package");
    }
    zip_ = std::make_unique<handle>();
    zip_->zip = zip_library().open_from_source(source, ZIP_RDONLY | ZIP_CHECKCONS, &error);
    if (zip_->zip == nullptr) {
        zip_library().source_free(source);
        const int code = zip_library().error_code_zip(&error);
        zip_library().error_fini(&error);
        if (code == ZIP_ER_NOZIP)
            throw workbook_error("it is not a zip package, so not an .xlsx or .ods workbook");
        if (code == ZIP_ER_INCONS || code == ZIP_ER_EOF || code == ZIP_ER_READ)
            throw workbook_error("the package is truncated or damaged (its zip directory does "
                                 "not match its contents)");
        throw workbook_error("the package cannot be opened as a zip archive");
    }
    zip_library().error_fini(&error);
    const zip_int64_t entries = zip_library().get_num_entries(zip_->zip, 0);
    if (entries < 0 || static_cast<std::uint64_t>(entries) > limits_.max_entries)
        throw workbook_error(fmt::format("the package holds more than {} parts, more than any "
                                         "workbook needs",
                                         limits_.max_entries));
}

archive::~archive() = default;

bool archive::has(std::string_view name) const {
    return zip_library().name_locate(zip_->zip, std::string(name).c_str(), 0) >= 0;
}

std::optional<std::string> archive::read(std::string_view name) {
    const std::string key(name);
    const zip_int64_t index = zip_library().name_locate(zip_->zip, key.c_str(), 0);
    if (index < 0)
        return std::nullopt;
    zip_stat_t st;
    zip_library().stat_init(&st);
    if (zip_library().stat_index(zip_->zip, static_cast<zip_uint64_t>(index), 0, &st) != 0)
        throw workbook_error(fmt::format("the part '{}' cannot be read", key));
    if ((st.valid & ZIP_STAT_ENCRYPTION_METHOD) != 0 && st.encryption_method != ZIP_EM_NONE)
        throw workbook_error("the workbook is encrypted (password-protected); save a copy "
                             "without a password to check it");
    zip_file_t* file = zip_library().fopen_index(zip_->zip, static_cast<zip_uint64_t>(index), 0);
    if (file == nullptr)
        throw workbook_error(fmt::format("the part '{}' cannot be unpacked (an unsupported "
                                         "compression method, or a damaged package)",
                                         key));
    std::string out;
    char buffer[65536];
    bool failed = false;
    for (;;) {
        const zip_int64_t n = zip_library().fread(file, buffer, sizeof buffer);
        if (n < 0) {
            failed = true;
            break;
        }
        if (n == 0)
            break;
        out.append(buffer, static_cast<std::size_t>(n));
        const bool too_big = out.size() > limits_.max_entry_bytes ||
                             total_read_ + out.size() > limits_.max_total_bytes;
        const bool too_compressed =
            out.size() > (1U << 20) && (st.valid & ZIP_STAT_COMP_SIZE) != 0 &&
            static_cast<double>(out.size()) >
                limits_.max_ratio * static_cast<double>(std::max<zip_uint64_t>(st.comp_size, 1));
        if (too_big || too_compressed) {
            zip_library().fclose(file);
            throw workbook_error(fmt::format(
                "the part '{}' unpacks to {} (a compression bomb, or a workbook "
                "beyond the limits plumb reads: {} MiB per part, a ratio of {:g} to 1)",
                key, too_big ? "more than the size limit" : "far more than its packed size",
                limits_.max_entry_bytes >> 20, limits_.max_ratio));
        }
    }
    zip_library().fclose(file);
    if (failed)
        throw workbook_error(fmt::format("the part '{}' is damaged or truncated (its data does "
                                         "not unpack, or fails its checksum)",
                                         key));
    total_read_ += out.size();
    return out;
}

} // namespace plumb::sheets
