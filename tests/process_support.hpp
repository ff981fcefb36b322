// Runs a program with arguments in a chosen folder and collects its exit status and output;
// for the tests that run plumb, Chromium or the SARIF validator.
#pragma once

#include <cerrno>
#include <cstring>
#include <fcntl.h>
#include <filesystem>
#include <poll.h>
#include <spawn.h>
#include <stdexcept>
#include <string>
#include <sys/wait.h>
#include <unistd.h>
#include <vector>

extern char** environ;

namespace plumb_test {

struct process_result {
    int status = -1; // exit status; -1 when the process did not exit normally
    std::string out;
    std::string err;
};

// Runs args[0] (searched on PATH) with stdout and stderr on pipes, in `folder` when given, with
// `environment` ("NAME=value" strings) instead of this process's own when given.
inline process_result run_process(const std::vector<std::string>& args,
                                  const std::filesystem::path& folder = {},
                                  const std::vector<std::string>* environment = nullptr) {
    std::vector<std::string> env_strings;
    std::vector<char*> envp;
    if (environment != nullptr) {
        env_strings = *environment;
        for (auto& s : env_strings)
            envp.push_back(s.data());
        envp.push_back(nullptr);
    }
    std::vector<std::string> argv_strings = args;
    std::vector<char*> argv;
    for (auto& s : argv_strings)
        argv.push_back(s.data());
    argv.push_back(nullptr);
    int out_pipe[2];
    int err_pipe[2];
    if (pipe(out_pipe) != 0 || pipe(err_pipe) != 0)
        throw std::runtime_error("pipe failed");
    posix_spawn_file_actions_t actions;
    posix_spawn_file_actions_init(&actions);
    posix_spawn_file_actions_addclose(&actions, out_pipe[0]);
    posix_spawn_file_actions_addclose(&actions, err_pipe[0]);
    posix_spawn_file_actions_adddup2(&actions, out_pipe[1], STDOUT_FILENO);
    posix_spawn_file_actions_adddup2(&actions, err_pipe[1], STDERR_FILENO);
    posix_spawn_file_actions_addclose(&actions, out_pipe[1]);
    posix_spawn_file_actions_addclose(&actions, err_pipe[1]);
    posix_spawn_file_actions_addopen(&actions, STDIN_FILENO, "/dev/null", O_RDONLY, 0);
    if (!folder.empty())
        posix_spawn_file_actions_addchdir_np(&actions, folder.c_str());
    pid_t pid = 0;
    const int spawned = posix_spawnp(&pid, argv_strings[0].c_str(), &actions, nullptr, argv.data(),
                                     environment != nullptr ? envp.data() : environ);
    posix_spawn_file_actions_destroy(&actions);
    close(out_pipe[1]);
    close(err_pipe[1]);
    process_result result;
    if (spawned != 0) {
        close(out_pipe[0]);
        close(err_pipe[0]);
        result.err = std::string("cannot run ") + argv_strings[0] + ": " + std::strerror(spawned);
        return result;
    }
    // Both pipes together, so that a child filling one cannot block on the other.
    pollfd fds[2] = {{out_pipe[0], POLLIN, 0}, {err_pipe[0], POLLIN, 0}};
    std::string* sinks[2] = {&result.out, &result.err};
    int open_pipes = 2;
    while (open_pipes > 0) {
        if (poll(fds, 2, -1) < 0) {
            if (errno == EINTR)
                continue;
            break;
        }
        for (int i = 0; i < 2; ++i) {
            if (fds[i].fd < 0 || fds[i].revents == 0)
                continue;
            char buffer[65536];
            const ssize_t n = read(fds[i].fd, buffer, sizeof buffer);
            if (n > 0) {
                sinks[i]->append(buffer, static_cast<std::size_t>(n));
            } else if (n == 0 || errno != EINTR) {
                close(fds[i].fd);
                fds[i].fd = -1;
                --open_pipes;
            }
        }
    }
    int wait_status = 0;
    while (waitpid(pid, &wait_status, 0) < 0 && errno == EINTR) {
    }
    result.status = WIFEXITED(wait_status) ? WEXITSTATUS(wait_status) : -1;
    return result;
}

// A fresh folder under the system's temporary folder, removed afterwards.
class scratch_folder {
  public:
    explicit scratch_folder(const std::string& tag) {
        static int counter = 0;
        path_ = std::filesystem::temp_directory_path() /
                ("plumb-" + tag + "-" + std::to_string(getpid()) + "-" + std::to_string(counter++));
        std::filesystem::remove_all(path_);
        std::filesystem::create_directories(path_);
    }
    scratch_folder(const scratch_folder&) = delete;
    scratch_folder& operator=(const scratch_folder&) = delete;
    ~scratch_folder() {
        std::error_code ignored;
        std::filesystem::remove_all(path_, ignored);
    }
    [[nodiscard]] const std::filesystem::path& path() const { return path_; }
    std::filesystem::path write(const std::string& name, std::string_view text) const;

  private:
    std::filesystem::path path_;
};

} // namespace plumb_test

#include <fstream>

inline std::filesystem::path plumb_test::scratch_folder::write(const std::string& name,
                                                               std::string_view text) const {
    const std::filesystem::path p = path_ / name;
    std::filesystem::create_directories(p.parent_path());
    std::ofstream out(p, std::ios::binary);
    out.write(text.data(), static_cast<std::streamsize>(text.size()));
    return p;
}
