// The parts of a zip package held in memory, read with libzip under limits.
#pragma once

#include "sheets/workbook.hpp"

#include <memory>
#include <optional>
#include <string>
#include <string_view>

namespace plumb::sheets {

class archive {
  public:
    // Opens the package read-only from memory. Throws workbook_error: not a zip, truncated,
    // too many entries.
    archive(std::string_view bytes, const read_limits& limits);
    ~archive();
    archive(const archive&) = delete;
    archive& operator=(const archive&) = delete;

    [[nodiscard]] bool has(std::string_view name) const;
    // The part's bytes, or empty when the package has no such part. Throws workbook_error
    // when the part is encrypted, damaged or larger than the limits allow.
    std::optional<std::string> read(std::string_view name);

  private:
    struct handle;
    std::unique_ptr<handle> zip_;
    const read_limits& limits_;
    std::size_t total_read_ = 0;
};

} // namespace plumb::sheets
