// plumb_bench: throughput of check_paths on a large generated corpus, and the cost of one small
// check from process start. It prints figures to read; it is not a timed test, because a shared
// machine's timings make poor pass/fail thresholds. It does fail when the checker's verdicts on
// the corpus differ from the mistakes planted in it, so a run doubles as a sanity check.
#include "corpus.hpp"

#include "plumb/check.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cerrno>
#include <charconv>
#include <chrono>
#include <cmath>
#include <cstdlib>
#include <cstring>
#include <exception>
#include <fcntl.h>
#include <fstream>
#include <map>
#include <optional>
#include <sched.h>
#include <spawn.h>
#include <string>
#include <string_view>
#include <sys/wait.h>
#include <unistd.h>
#include <utility>
#include <vector>

extern char** environ; // NOLINT: POSIX declares it for posix_spawn's environment

#ifndef PLUMB_CLI_PATH
#define PLUMB_CLI_PATH "plumb"
#endif
#ifndef PLUMB_BUILD_TYPE
#define PLUMB_BUILD_TYPE ""
#endif

namespace fs = std::filesystem;
using clock_type = std::chrono::steady_clock;

namespace {

struct options {
    std::size_t equations = 1'000'000;
    std::size_t runs = 3;
    std::size_t spawns = 50;
    std::string cli = PLUMB_CLI_PATH;
    std::optional<fs::path> keep;
};

constexpr std::string_view usage = R"(usage: plumb_bench [options]
  --equations N   formulas in the generated corpus (default 1000000)
  --runs N        timed check_paths runs after one warm-up (default 3)
  --spawns N      CLI invocations for the start-up figure (default 50; 0 skips it)
  --cli PATH      the plumb binary to spawn (default: the one built with this benchmark)
  --keep DIR      write the corpus to DIR (new or empty) and leave it there
)";

std::optional<std::size_t> parse_count(std::string_view text) {
    std::size_t value = 0;
    const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
    if (ec != std::errc{} || end != text.data() + text.size())
        return std::nullopt;
    return value;
}

std::optional<options> parse_options(int argc, char** argv) {
    options opt;
    for (int i = 1; i < argc; ++i) {
        const std::string_view arg = argv[i];
        if (arg == "--help" || arg == "-h") {
            fmt::print("{}", usage);
            std::exit(0);
        }
        if (i + 1 >= argc) {
            fmt::print(stderr, "plumb_bench: {} needs a value\n{}", arg, usage);
            return std::nullopt;
        }
        const std::string_view value = argv[++i];
        std::optional<std::size_t> n;
        if (arg == "--equations" && (n = parse_count(value)) && *n > 0) {
            opt.equations = *n;
        } else if (arg == "--runs" && (n = parse_count(value)) && *n > 0) {
            opt.runs = *n;
        } else if (arg == "--spawns" && (n = parse_count(value))) {
            opt.spawns = *n;
        } else if (arg == "--cli") {
            opt.cli = value;
        } else if (arg == "--keep") {
            opt.keep = fs::path(value);
        } else {
            fmt::print(stderr, "plumb_bench: bad option {} {}\n{}", arg, value, usage);
            return std::nullopt;
        }
    }
    return opt;
}

double seconds(clock_type::duration d) {
    return std::chrono::duration<double>(d).count();
}

double median(std::vector<double> v) {
    std::sort(v.begin(), v.end());
    const std::size_t n = v.size();
    return n % 2 == 1 ? v[n / 2] : (v[n / 2 - 1] + v[n / 2]) / 2;
}

// Nearest-rank percentile: the smallest sample with at least p of the samples at or below it.
double percentile(std::vector<double> v, double p) {
    std::sort(v.begin(), v.end());
    const auto rank = static_cast<std::size_t>(std::ceil(p * static_cast<double>(v.size())));
    return v[std::clamp<std::size_t>(rank, 1, v.size()) - 1];
}

std::string cpu_model() {
    std::ifstream in("/proc/cpuinfo");
    std::string line;
    while (std::getline(in, line)) {
        if (line.rfind("model name", 0) == 0) {
            const std::size_t colon = line.find(':');
            if (colon != std::string::npos)
                return line.substr(line.find_first_not_of(" \t", colon + 1));
        }
    }
    return "unknown";
}

// What `nproc` prints: the CPUs this process may run on, not the machine's total.
long usable_cpus() {
    cpu_set_t set;
    CPU_ZERO(&set);
    if (sched_getaffinity(0, sizeof set, &set) == 0)
        return CPU_COUNT(&set);
    return sysconf(_SC_NPROCESSORS_ONLN);
}

std::string compiler() {
#if defined(__clang__)
    return fmt::format("clang {}", __clang_version__);
#elif defined(__GNUC__)
    return fmt::format("GCC {}", __VERSION__);
#else
    return __VERSION__;
#endif
}

std::string build_type() {
    std::string type = PLUMB_BUILD_TYPE;
    if (type.empty())
        type = "(none)";
#if defined(__OPTIMIZE__)
    type += ", optimised";
#else
    type += ", not optimised";
#endif
#if defined(PLUMB_PROFILE_STAGE)
    if (const std::string_view stage = PLUMB_PROFILE_STAGE; stage == "use")
        type += ", profile-guided";
    else if (stage == "generate")
        type += ", instrumented for a profile (not for timing)";
#endif
#if defined(NDEBUG)
    type += ", NDEBUG";
#else
    type += ", assertions on";
#endif
    return type;
}

// Makes the corpus directory: a fresh one under the temp dir, or the --keep one, which must be
// new or empty so that stale files from an earlier run are not checked too.
fs::path make_corpus_dir(const options& opt) {
    if (opt.keep) {
        if (fs::exists(*opt.keep) && !fs::is_empty(*opt.keep))
            throw std::runtime_error(
                fmt::format("--keep {}: directory is not empty", opt.keep->string()));
        fs::create_directories(*opt.keep);
        return fs::absolute(*opt.keep);
    }
    std::string pattern = (fs::temp_directory_path() / "plumb-bench-XXXXXX").string();
    if (mkdtemp(pattern.data()) == nullptr)
        throw std::runtime_error(fmt::format("cannot create a temp dir: {}", std::strerror(errno)));
    return pattern;
}

// Compares the checker's findings with the planted mistakes, formula by formula.
struct verdict {
    std::size_t planted = 0;
    std::size_t findings = 0;
    std::size_t planted_flagged = 0;
    std::size_t rule_as_expected = 0;
    std::size_t stray = 0; // findings on a formula that was not planted, or on no file
    std::map<std::string, std::size_t> stray_rules;
    std::vector<std::string> samples;

    [[nodiscard]] bool ok() const { return planted_flagged == planted && stray == 0; }
};

verdict compare(const plumb::check_report& report, const plumb_bench::corpus_summary& corpus,
                const fs::path& dir) {
    verdict v;
    v.planted = corpus.planted.size();
    v.findings = report.diagnostics.size();

    // file -> (first line -> index into corpus.planted)
    std::map<std::string, std::map<std::uint32_t, std::size_t>> index;
    std::map<const plumb::source_file*, std::string> relative; // one path lookup per file
    for (std::size_t i = 0; i < corpus.planted.size(); ++i)
        index[corpus.planted[i].file][corpus.planted[i].first_line] = i;
    std::vector<bool> flagged(corpus.planted.size(), false);
    std::vector<bool> rule_seen(corpus.planted.size(), false);

    for (const auto& d : report.diagnostics) {
        std::optional<std::size_t> hit;
        std::string where = "(no file)";
        if (d.where.file != nullptr) {
            const auto line = d.where.file->position(d.where.range.begin).line;
            auto [cached, fresh] = relative.try_emplace(d.where.file);
            if (fresh) {
                std::error_code ec;
                cached->second = fs::weakly_canonical(d.where.file->path(), ec)
                                     .lexically_relative(dir)
                                     .generic_string();
                if (ec || cached->second.empty())
                    cached->second = fs::path(d.where.file->path()).generic_string();
            }
            const std::string& rel = cached->second;
            where = fmt::format("{}:{}", rel, line);
            const auto file = index.find(rel);
            if (file != index.end()) {
                auto it = file->second.upper_bound(line);
                if (it != file->second.begin()) {
                    --it;
                    if (line <= corpus.planted[it->second].last_line)
                        hit = it->second;
                }
            }
        }
        if (hit) {
            flagged[*hit] = true;
            if (d.rule == corpus.planted[*hit].rule)
                rule_seen[*hit] = true;
        } else {
            ++v.stray;
            ++v.stray_rules[d.rule];
            if (v.samples.size() < 5)
                v.samples.push_back(
                    fmt::format("unexpected: {}: {} [{}]", where, d.message, d.rule));
        }
    }
    for (std::size_t i = 0; i < flagged.size(); ++i) {
        v.planted_flagged += flagged[i] ? 1 : 0;
        v.rule_as_expected += rule_seen[i] ? 1 : 0;
        if (!flagged[i] && v.samples.size() < 10)
            v.samples.push_back(fmt::format("missed: {}:{} (expected [{}])", corpus.planted[i].file,
                                            corpus.planted[i].first_line, corpus.planted[i].rule));
    }
    return v;
}

struct spawn_result {
    std::vector<double> ms;
    std::size_t exit0 = 0;
    std::size_t exit1 = 0;
    std::vector<std::string> failures;
};

// Times `cli check file` from posix_spawn to waitpid, output discarded: what a user waits for
// when an editor or a pre-commit hook runs the checker on one small file.
spawn_result time_cli(const std::string& cli, const fs::path& file, std::size_t count) {
    spawn_result result;
    posix_spawn_file_actions_t actions;
    posix_spawn_file_actions_init(&actions);
    posix_spawn_file_actions_addopen(&actions, STDOUT_FILENO, "/dev/null", O_WRONLY, 0);
    posix_spawn_file_actions_addopen(&actions, STDERR_FILENO, "/dev/null", O_WRONLY, 0);
    std::string arg0 = cli;
    std::string arg1 = "check";
    std::string arg2 = file.string();
    char* argv[] = {arg0.data(), arg1.data(), arg2.data(), nullptr};

    for (std::size_t i = 0; i < count; ++i) {
        const auto start = clock_type::now();
        pid_t pid = 0;
        const int rc = posix_spawn(&pid, cli.c_str(), &actions, nullptr, argv, environ);
        if (rc != 0) {
            result.failures.push_back(fmt::format("cannot start {}: {}", cli, std::strerror(rc)));
            break;
        }
        int status = 0;
        while (waitpid(pid, &status, 0) < 0) {
            if (errno != EINTR) {
                result.failures.push_back(fmt::format("waitpid: {}", std::strerror(errno)));
                break;
            }
        }
        result.ms.push_back(seconds(clock_type::now() - start) * 1000.0);
        if (WIFEXITED(status) && WEXITSTATUS(status) == 0) {
            ++result.exit0;
        } else if (WIFEXITED(status) && WEXITSTATUS(status) == 1) {
            ++result.exit1;
        } else if (result.failures.size() < 5) {
            result.failures.push_back(
                WIFSIGNALED(status)
                    ? fmt::format("run {}: killed by signal {}", i + 1, WTERMSIG(status))
                    : fmt::format("run {}: exit status {}", i + 1, WEXITSTATUS(status)));
        }
    }
    posix_spawn_file_actions_destroy(&actions);
    return result;
}

// fmt 9 has no digit grouping for integers in the default locale; engineers read 1,000,000
// faster than 1000000.
std::string grouped(std::size_t n) {
    std::string digits = fmt::format("{}", n);
    std::string out;
    for (std::size_t i = 0; i < digits.size(); ++i) {
        if (i > 0 && (digits.size() - i) % 3 == 0)
            out += ',';
        out += digits[i];
    }
    return out;
}

// Removes the generated corpus however the run ends, unless it was asked to be kept.
class corpus_dir {
  public:
    explicit corpus_dir(const options& opt)
        : path_(make_corpus_dir(opt)), keep_(opt.keep.has_value()) {}
    corpus_dir(const corpus_dir&) = delete;
    corpus_dir& operator=(const corpus_dir&) = delete;
    ~corpus_dir() {
        if (keep_)
            return;
        std::error_code ec;
        fs::remove_all(path_, ec);
        if (ec)
            fmt::print(stderr, "plumb_bench: could not remove {}: {}\n", path_.string(),
                       ec.message());
    }
    [[nodiscard]] const fs::path& path() const { return path_; }

  private:
    fs::path path_;
    bool keep_;
};

int run(const options& opt) {
    bool failed = false;
    fmt::print("plumb_bench\n");
    fmt::print("machine:  {} CPUs usable (nproc), {}\n", usable_cpus(), cpu_model());
    fmt::print("compiler: {}; build type {}\n", compiler(), build_type());

    const corpus_dir holder(opt);
    // Canonical, so that the paths in diagnostics can be matched against it.
    const fs::path dir = fs::weakly_canonical(holder.path());
    const auto gen_start = clock_type::now();
    const plumb_bench::corpus_summary corpus = plumb_bench::write_corpus(dir, opt.equations);
    const double gen_s = seconds(clock_type::now() - gen_start);
    if (opt.keep) {
        std::ofstream list(dir / "planted.txt");
        for (const auto& p : corpus.planted)
            list << p.file << ':' << p.first_line << ' ' << p.rule << '\n';
    }
    fmt::print("corpus:   {} in {} files (dictionary of {} symbols), {} equations, {} bytes, "
               "{} planted inconsistencies; generator start {:#x}; written in {:.2f} s\n",
               dir.string(), corpus.files, corpus.dictionary_symbols, grouped(corpus.equations),
               grouped(corpus.bytes), grouped(corpus.planted.size()), plumb_bench::rng_start,
               gen_s);

    // The warm-up pulls the files into the page cache; its report is the one judged.
    const auto warm_start = clock_type::now();
    const plumb::check_report warm = plumb::check_paths({dir});
    const double warm_s = seconds(clock_type::now() - warm_start);
    fmt::print("checker:  {} files, {} formulas, {} bytes read; {} findings ({} errors, "
               "{} warnings, {} notes); warm-up {:.3f} s\n",
               warm.files_checked, grouped(warm.formulas_checked), grouped(warm.bytes_checked),
               grouped(warm.diagnostics.size()), grouped(warm.count(plumb::severity::error)),
               grouped(warm.count(plumb::severity::warning)),
               grouped(warm.count(plumb::severity::note)), warm_s);
    if (warm.input_failed) {
        fmt::print("FAILED:   the checker could not read or parse part of the corpus\n");
        failed = true;
    }
    if (warm.formulas_checked != corpus.equations)
        fmt::print("note:     the checker counted {} formulas, the corpus has {}\n",
                   grouped(warm.formulas_checked), grouped(corpus.equations));

    const verdict v = compare(warm, corpus, dir);
    fmt::print("sanity:   planted {}, findings {}; planted formulas flagged {}/{} (rule as "
               "expected {}), findings elsewhere {} -> {}\n",
               grouped(v.planted), grouped(v.findings), grouped(v.planted_flagged),
               grouped(v.planted), grouped(v.rule_as_expected), grouped(v.stray),
               v.ok() ? "OK" : "MISMATCH");
    for (const auto& [rule, n] : v.stray_rules)
        fmt::print("          findings elsewhere [{}]: {}\n", rule, grouped(n));
    for (const auto& s : v.samples)
        fmt::print("          {}\n", s);
    failed = failed || !v.ok();

    const double bytes =
        static_cast<double>(warm.bytes_checked > 0 ? warm.bytes_checked : corpus.bytes);
    const auto eq = static_cast<double>(corpus.equations);
    // The same corpus on one thread and on two (each thread checks a run of the files in a
    // session of its own; the report is the same either way).
    double one_thread_best = 0.0;
    for (const unsigned jobs : {1U, 2U}) {
        plumb::check_options options;
        options.jobs = jobs;
        std::vector<double> times;
        for (std::size_t i = 0; i < opt.runs; ++i) {
            const auto start = clock_type::now();
            const plumb::check_report report = plumb::check_paths({dir}, options);
            times.push_back(seconds(clock_type::now() - start));
            if (report.diagnostics.size() != warm.diagnostics.size()) {
                fmt::print("FAILED:   run {} on {} thread(s) gave {} findings, the warm-up {}\n",
                           i + 1, jobs, report.diagnostics.size(), warm.diagnostics.size());
                failed = true;
            }
        }
        const double best = *std::min_element(times.begin(), times.end());
        const double med = median(times);
        if (jobs == 1)
            one_thread_best = best;
        fmt::print("check_paths, --jobs {}, {} timed run{} after 1 warm-up:\n", jobs, opt.runs,
                   opt.runs == 1 ? "" : "s");
        fmt::print("  best   {:8.3f} s  {:8.2f} MB/s  {:>12} equations/s\n", best,
                   bytes / best / 1e6, grouped(static_cast<std::size_t>(eq / best)));
        fmt::print("  median {:8.3f} s  {:8.2f} MB/s  {:>12} equations/s\n", med, bytes / med / 1e6,
                   grouped(static_cast<std::size_t>(eq / med)));
        if (jobs > 1)
            fmt::print("  speed-up over one thread (best runs): {:.2f}x\n", one_thread_best / best);
    }

    if (opt.spawns > 0) {
        const fs::path small = dir / "small" / "pump-check.plumb";
        const fs::path typo = dir / "small" / "pump-check-typo.plumb";
        fs::create_directories(small.parent_path());
        plumb_bench::write_small_file(small);
        plumb_bench::write_small_file(typo, plumb_bench::small_file_variant::with_typo);
        // plumb and /bin/true take turns, so that a change in the machine's load while they
        // run weighs on both alike. /bin/true is the floor any program pays here for fork,
        // exec and the dynamic loader. The file with a typo times the error path, where the
        // checker throws: the first exception of a process once cost more than the whole check.
        const bool with_floor = access("/bin/true", X_OK) == 0;
        spawn_result s;
        spawn_result with_error;
        spawn_result floor;
        const auto take = [](spawn_result& into, const spawn_result& one) {
            into.ms.insert(into.ms.end(), one.ms.begin(), one.ms.end());
            into.exit0 += one.exit0;
            into.exit1 += one.exit1;
            into.failures.insert(into.failures.end(), one.failures.begin(), one.failures.end());
        };
        for (std::size_t i = 0; i < opt.spawns && s.failures.empty() && with_error.failures.empty();
             ++i) {
            take(s, time_cli(opt.cli, small, 1));
            take(with_error, time_cli(opt.cli, typo, 1));
            if (with_floor)
                take(floor, time_cli("/bin/true", small, 1));
        }
        if (s.ms.empty()) {
            fmt::print("start-up: no run completed\n");
        } else {
            fmt::print("start-up: `{} check` on a 10-formula file, {} runs: median {:.2f} ms, p90 "
                       "{:.2f} ms; exit 0: {}, exit 1: {}\n",
                       opt.cli, s.ms.size(), median(s.ms), percentile(s.ms, 0.9), s.exit0, s.exit1);
            if (!floor.ms.empty())
                fmt::print("          /bin/true spawned the same way, in turn with it: median "
                           "{:.2f} ms, p90 {:.2f} ms; plumb / true = {:.2f}x (medians)\n",
                           median(floor.ms), percentile(floor.ms, 0.9),
                           median(s.ms) / median(floor.ms));
        }
        if (!with_error.ms.empty()) {
            fmt::print("          the same file with a typo (an undeclared name; exit 1 in {} of "
                       "{} runs): median {:.2f} ms",
                       with_error.exit1, with_error.ms.size(), median(with_error.ms));
            if (!floor.ms.empty())
                fmt::print("; plumb / true = {:.2f}x", median(with_error.ms) / median(floor.ms));
            fmt::print("\n");
            if (with_error.exit1 != with_error.ms.size())
                with_error.failures.push_back("the file with a typo did not always exit 1");
        }
        for (const auto* r : {&s, &with_error})
            for (const auto& f : r->failures)
                fmt::print("FAILED:   {}\n", f);
        failed = failed || !s.failures.empty() || !with_error.failures.empty();
    }

    if (opt.keep)
        fmt::print("kept:     {} (planted.txt lists the planted formulas)\n", dir.string());
    fmt::print("result:   {}\n", failed ? "FAILED" : "ok");
    return failed ? 1 : 0;
}

} // namespace

int main(int argc, char** argv) {
    const auto opt = parse_options(argc, argv);
    if (!opt)
        return 2;
    try {
        return run(*opt);
    } catch (const std::exception& e) {
        fmt::print(stderr, "plumb_bench: {}\n", e.what());
        return 1;
    }
}
