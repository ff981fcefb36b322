#include "model/user_file.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cerrno>
#include <cstring>
#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

namespace plumb {

namespace {

// Closes the descriptor on every path out of read_user_file.
class descriptor {
  public:
    explicit descriptor(int fd) : fd_(fd) {}
    descriptor(const descriptor&) = delete;
    descriptor& operator=(const descriptor&) = delete;
    ~descriptor() {
        if (fd_ >= 0)
            ::close(fd_);
    }
    [[nodiscard]] int get() const { return fd_; }

  private:
    int fd_;
};

std::string open_problem(int error) {
    switch (error) {
    case ENOENT:
    case ENOTDIR:
        return "no such file";
    case EACCES:
    case EPERM:
        return "permission denied";
    case ELOOP:
        return "too many symbolic links";
    default:
        return std::strerror(error);
    }
}

std::string too_large(std::uint64_t limit) {
    return fmt::format("it is larger than plumb's limit of {} for one file", byte_size_text(limit));
}

} // namespace

std::string byte_size_text(std::uint64_t bytes) {
    if (bytes >= (std::uint64_t{1} << 20) && bytes % (std::uint64_t{1} << 20) == 0)
        return fmt::format("{} MiB", bytes >> 20);
    if (bytes >= 1024 && bytes % 1024 == 0)
        return fmt::format("{} KiB", bytes >> 10);
    return fmt::format("{} bytes", bytes);
}

user_file read_user_file(const std::filesystem::path& path, std::uint64_t limit) {
    user_file out;
    // O_NONBLOCK: opening a FIFO with no writer returns at once instead of waiting for one; the
    // file's type is then checked on the open descriptor, so it cannot change in between.
    const descriptor fd(::open(path.c_str(), O_RDONLY | O_NONBLOCK | O_CLOEXEC | O_NOCTTY));
    if (fd.get() < 0) {
        const int error = errno;
        out.missing = error == ENOENT || error == ENOTDIR;
        out.problem = open_problem(error);
        return out;
    }
    struct stat status {};
    if (::fstat(fd.get(), &status) != 0) {
        out.problem = std::strerror(errno);
        return out;
    }
    if (S_ISDIR(status.st_mode)) {
        out.problem = "it is a folder";
        return out;
    }
    if (!S_ISREG(status.st_mode)) {
        out.problem = S_ISFIFO(status.st_mode) ? "it is a pipe, not a regular file"
                      : S_ISCHR(status.st_mode) || S_ISBLK(status.st_mode)
                          ? "it is a device, not a regular file"
                          : "it is not a regular file";
        return out;
    }
    if (status.st_size < 0 || static_cast<std::uint64_t>(status.st_size) > limit) {
        out.problem = too_large(limit);
        return out;
    }
    // The size from stat is a hint only: a file can grow while it is read, and some (those
    // under /proc) report 0. The limit is what stops the read. One byte more than the size
    // lets the read that finds the end happen without growing, and so zeroing, the buffer to
    // twice the file's size (issue 12).
    out.text.resize(static_cast<std::size_t>(status.st_size) + 1);
    std::uint64_t used = 0;
    for (;;) {
        if (used == out.text.size())
            out.text.resize(static_cast<std::size_t>(
                std::min<std::uint64_t>(limit + 1, std::max<std::uint64_t>(used * 2, 4096))));
        const ssize_t got = ::read(fd.get(), out.text.data() + used, out.text.size() - used);
        if (got < 0) {
            if (errno == EINTR)
                continue;
            out.text.clear();
            out.problem = fmt::format("a read error occurred ({})", std::strerror(errno));
            return out;
        }
        if (got == 0)
            break;
        used += static_cast<std::uint64_t>(got);
        if (used > limit) {
            out.text.clear();
            out.problem = too_large(limit);
            return out;
        }
    }
    out.text.resize(static_cast<std::size_t>(used));
    return out;
}

} // namespace plumb
