// Board files checked against their circuit: any bytes that read to a board are checked and
// reported (text and JSON) without a crash, hang or leak, and within the per-input time limit
// (.ci/fuzz runs this harness on inputs up to 1 MB, so that a check or report slower than linear
// shows as a timeout).
#include <cstddef>
#include <cstdint>
#include <string>
#include <string_view>

#include "fuzz_check.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/report/report_format.hpp"
#include "netcheck/file/board_file.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    const auto board = netcheck::readBoard(text, "fuzz.board.json");
    if (!board.ok()) return 0;
    const netcheck::CheckReport report = netcheck::check(*board.value);
    for (const auto* findings : {&report.errors, &report.warnings}) {
        for (const netcheck::Finding& finding : *findings)
            fuzz::require(!finding.message.empty(), "every finding says what is wrong");
    }
    const std::string printed = netcheck::formatReportText(report, *board.value);
    fuzz::require(!printed.empty() && printed.back() == '\n', "the text report ends its last line");
    (void)netcheck::reportJson(report).dump();
    // The editor re-checks in the memory of the previous check: it must find the same.
    netcheck::Checker checker;
    (void)checker.check(*board.value);
    const netcheck::CheckReport again = checker.check(*board.value);
    fuzz::require(again.errors.size() == report.errors.size() &&
                      again.warnings.size() == report.warnings.size(),
                  "a re-check finds the same");
    return 0;
}
