// Recovery copies belong to the editor that wrote them: a copy is offered only when its editor has
// ended, one editor's clean exit never removes another's copy, and the file each editor has open
// is seen by the others. Other editors are real processes (fork), since the locks are per process.
#include <sys/wait.h>
#include <unistd.h>

#include <filesystem>
#include <fstream>
#include <random>

#include <doctest/doctest.h>

#include "editor/files/disk_stamp.hpp"
#include "editor/files/recovery.hpp"

using namespace stripsmith;
namespace fs = std::filesystem;

namespace {

struct TempFolder {
    fs::path path;
    TempFolder() {
        std::random_device random;
        path = fs::temp_directory_path() / ("stripsmith-recovery-" + std::to_string(random()));
        fs::create_directories(path);
    }
    ~TempFolder() {
        std::error_code ignored;
        fs::remove_all(path, ignored);
    }
};

std::size_t fileCount(const fs::path& folder) {
    std::size_t count = 0;
    for ([[maybe_unused]] const auto& entry : fs::directory_iterator(folder)) ++count;
    return count;
}

// Another editor: a child process that takes a slot, records `openFile`, writes a copy of
// `board` when not empty, tells the parent, and waits until the parent closes `release`; then it
// ends the way a crash does (no clean-up), or cleanly when `clean`.
struct OtherEditor {
    pid_t pid = -1;
    int release = -1;

    OtherEditor(const std::string& folder, const std::string& openFile, const std::string& board,
                bool clean) {
        int ready[2], hold[2];
        REQUIRE(::pipe(ready) == 0);
        REQUIRE(::pipe(hold) == 0);
        pid = ::fork();
        REQUIRE(pid >= 0);
        if (pid == 0) {
            ::close(ready[0]);
            ::close(hold[1]);
            std::string error;
            auto slot = RecoverySlot::create(folder, error);
            if (!slot) ::_exit(3);
            slot->setOpenFile(openFile);
            if (!board.empty() && slot->write({board, openFile})) ::_exit(4);
            char byte = 'r';
            (void)!::write(ready[1], &byte, 1);
            (void)!::read(hold[0], &byte, 1);  // until the parent closes its end
            if (clean) slot->remove();
            ::_exit(0);
        }
        ::close(ready[1]);
        ::close(hold[0]);
        release = hold[1];
        char byte = 0;
        REQUIRE(::read(ready[0], &byte, 1) == 1);
        ::close(ready[0]);
    }
    // Lets the child end and waits for it.
    void end() {
        ::close(release);
        int status = 0;
        REQUIRE(::waitpid(pid, &status, 0) == pid);
        REQUIRE(WIFEXITED(status));
        REQUIRE(WEXITSTATUS(status) == 0);
    }
};

}  // namespace

TEST_CASE("recovery copies") {
    TempFolder temp;
    const std::string folder = temp.path.string();
    const std::string boardPath = (temp.path / "a.board.json").string();

    SUBCASE("a running editor's copy is not offered; once it has crashed, it is") {
        OtherEditor running(folder, boardPath, "{\"autosaved\": 1}", false);
        CHECK_FALSE(findLeftCopy(folder).has_value());
        running.end();  // no clean-up: as after SIGKILL
        auto left = findLeftCopy(folder);
        REQUIRE(left.has_value());
        CHECK(left->file.boardText == "{\"autosaved\": 1}");
        CHECK(left->file.originalPath == boardPath);
        // While it is offered here, no other editor offers it too (a lock is per open file, so
        // a second look from this process stands for another editor).
        CHECK_FALSE(findLeftCopy(folder).has_value());
        // Declining the offer keeps the copy for the next start; Discard removes it.
        left.reset();
        left = findLeftCopy(folder);
        REQUIRE(left.has_value());
        left->slot.remove();
        CHECK_FALSE(findLeftCopy(folder).has_value());
        CHECK(fileCount(temp.path) == 0);
    }

    SUBCASE("another editor's clean exit leaves this editor's copy alone") {
        std::string error;
        auto mine = RecoverySlot::create(folder, error);
        REQUIRE(mine.has_value());
        REQUIRE_FALSE(mine->write({"{\"mine\": 1}", boardPath}).has_value());
        OtherEditor other(folder, (temp.path / "b.board.json").string(), "", true);
        other.end();
        // Still there, and still not offered while this editor runs.
        CHECK_FALSE(findLeftCopy(folder).has_value());
        mine.reset();  // this editor dies: its lock goes, its files stay
        auto left = findLeftCopy(folder);
        REQUIRE(left.has_value());
        CHECK(left->file.boardText == "{\"mine\": 1}");
    }

    SUBCASE("a saved board has no copy; an editor that ended with nothing unsaved leaves none") {
        std::string error;
        auto mine = RecoverySlot::create(folder, error);
        REQUIRE(mine.has_value());
        REQUIRE_FALSE(mine->write({"{}", boardPath}).has_value());
        mine->clearCopy();
        mine.reset();
        CHECK_FALSE(findLeftCopy(folder).has_value());
        CHECK(fileCount(temp.path) == 0);  // its slot tidied away
    }

    SUBCASE("the single copy kept by earlier versions is offered like a left copy") {
        std::ofstream(temp.path / "recovery.board.json") << "{\"old\": 1}";
        std::ofstream(temp.path / "recovery.info.json") << "{\"original_path\": \"/x/a.board.json\"}";
        auto left = findLeftCopy(folder);
        REQUIRE(left.has_value());
        CHECK(left->file.boardText == "{\"old\": 1}");
        CHECK(left->file.originalPath == "/x/a.board.json");
        CHECK_FALSE(fs::exists(temp.path / "recovery.board.json"));
        left.reset();  // not answered: still there at the next start
        CHECK(findLeftCopy(folder).has_value());
    }

    SUBCASE("the file another running editor has open is seen, and not once it has ended") {
        OtherEditor other(folder, boardPath, "", false);
        // The same file by another spelling of its path.
        const std::string spelled = (temp.path / "." / "a.board.json").string();
        CHECK(editorsWithOpen(folder, spelled) == std::vector<long>{other.pid});
        CHECK(editorsWithOpen(folder, (temp.path / "b.board.json").string()).empty());
        other.end();
        CHECK(editorsWithOpen(folder, boardPath).empty());
    }
}

TEST_CASE("disk stamps") {
    TempFolder temp;
    const std::string path = (temp.path / "a.board.json").string();
    auto spit = [&](const std::string& text) { std::ofstream(path, std::ios::binary) << text; };
    spit("first");
    const DiskStamp stamp = stampOf("first", path);
    CHECK_FALSE(changedOnDisk(stamp, path));
    // The same size, written again within the same clock tick or not: the contents decide.
    spit("fir5t");
    CHECK(changedOnDisk(stamp, path));
    spit("first");
    CHECK_FALSE(changedOnDisk(stamp, path));
    fs::remove(path);
    CHECK_FALSE(changedOnDisk(stamp, path));  // gone: nothing there to lose
}
