// Writing the build sheet: PDF and SVG files, their page sizes, and plain-word failures.
#include <doctest/doctest.h>

#include <unistd.h>

#include <filesystem>
#include <random>
#include <regex>

#include "../test_support.hpp"
#include "editor/sheet/sheet.hpp"
#include "netcheck/file/board_file.hpp"

namespace fs = std::filesystem;

namespace {

fs::path scratch(const std::string& name) {
    fs::path folder = fs::temp_directory_path() /
                      ("stripsmith-sheet-tests-" + std::to_string(static_cast<long>(::getpid())));
    fs::create_directories(folder);
    return folder / name;
}

netcheck::Board testBoard() {
    std::string path = test_support::sourcePath("tests/sheet/boards/booster.board.json");
    auto read = netcheck::readBoard(test_support::readTextFile(path), path);
    REQUIRE_MESSAGE(read.ok(), (read.error ? read.error->describe() : ""));
    return *read.value;
}

/// The numbers of the root element's attribute `name`, e.g. width="210mm" -> "210mm".
std::string rootAttribute(const std::string& svg, const std::string& name) {
    std::smatch match;
    std::regex pattern("<svg[^>]*\\s" + name + "=\"([^\"]*)\"");
    return std::regex_search(svg, match, pattern) ? match[1].str() : std::string();
}

}  // namespace

TEST_CASE("sheet export") {
    netcheck::Board board = testBoard();

    SUBCASE("PDF") {
        fs::path out = scratch("booster.pdf");
        REQUIRE_FALSE(sheet::exportSheet(board, {}, out.string()).has_value());
        std::string bytes = test_support::readTextFile(out.string());
        // ISO 32000-1: a PDF file starts with its header "%PDF-".
        CHECK(bytes.rfind("%PDF-", 0) == 0);
        // A4 MediaBox in points (ISO 216 and 1/72 in units): 595.276 x 841.89.
        CHECK(bytes.find("/MediaBox [ 0 0 595.275") != std::string::npos);
    }

    SUBCASE("SVG is sized in millimetres") {
        fs::path out = scratch("booster.svg");
        REQUIRE_FALSE(sheet::exportSheet(board, {}, out.string()).has_value());
        std::string svg = test_support::readTextFile(out.string());
        // ISO 216: A4 is 210 mm wide; pages stack downwards, 297 mm each.
        CHECK(rootAttribute(svg, "width") == "210mm");
        std::string height = rootAttribute(svg, "height");
        REQUIRE(height.size() > 2);
        double mm = std::stod(height);
        CHECK(height.substr(height.size() - 2) == "mm");
        CHECK(std::fmod(mm, 297.0) == doctest::Approx(0.0));
        CHECK(rootAttribute(svg, "viewBox") == "0 0 210 " + height.substr(0, height.size() - 2));
    }

    SUBCASE("a sleeved link is drawn with its sleeve") {
        REQUIRE_FALSE(board.links.empty());
        fs::path bare = scratch("bare-link.svg");
        fs::path sleeved = scratch("sleeved-link.svg");
        REQUIRE_FALSE(sheet::exportSheet(board, {}, bare.string()).has_value());
        board.links[0].insulated = true;
        REQUIRE_FALSE(sheet::exportSheet(board, {}, sleeved.string()).has_value());
        // The sleeve's pale green, as cairo writes a stroke colour (0.62, 0.85, 0.68).
        const std::regex sleeve(R"(stroke:rgb\(62%,85%,68%\))");
        CHECK_FALSE(std::regex_search(test_support::readTextFile(bare.string()), sleeve));
        CHECK(std::regex_search(test_support::readTextFile(sleeved.string()), sleeve));
    }

    SUBCASE("letter paper") {
        fs::path out = scratch("booster-letter.svg");
        sheet::SheetOptions options;
        options.paper = sheet::Paper::Letter;
        REQUIRE_FALSE(sheet::exportSheet(board, options, out.string()).has_value());
        // US Letter is 8.5 in = 215.9 mm wide.
        CHECK(rootAttribute(test_support::readTextFile(out.string()), "width") == "215.9mm");
    }

    SUBCASE("an unknown extension is refused with the name") {
        auto error = sheet::exportSheet(board, {}, scratch("sheet.png").string());
        REQUIRE(error.has_value());
        CHECK(error->find("sheet.png") != std::string::npos);
        CHECK(error->find(".pdf or .svg") != std::string::npos);
        CHECK(sheet::isSheetPath("X.PDF"));
        CHECK_FALSE(sheet::isSheetPath("pdf"));
    }

    SUBCASE("a folder that does not exist is reported") {
        fs::path out = scratch("no-such-folder") / "sheet.pdf";
        auto error = sheet::exportSheet(board, {}, out.string());
        REQUIRE(error.has_value());
        CHECK(error->find(out.string()) != std::string::npos);
    }

    SUBCASE("random valid boards always give a sheet") {
        for (unsigned seed = 1; seed <= 12; ++seed) {
            CAPTURE(seed);
            std::mt19937 rng(seed);
            test_support::RandomBoardOptions options;
            options.maxRows = 70;
            options.maxCols = 110;
            netcheck::Board random = test_support::randomBoard(rng, options);
            fs::path out = scratch("random.pdf");
            auto error = sheet::exportSheet(random, {}, out.string());
            CHECK_FALSE(error.has_value());
            CHECK(fs::file_size(out) > 1000);
        }
    }
}
