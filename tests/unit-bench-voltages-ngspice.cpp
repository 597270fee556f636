// The in-process operating point (libngspice) against ngspice's own batch run (`ngspice -b`) of
// the same deck: every net within 1 mV. An independent path through the program's front end,
// its file reader and its output formatting. Skipped with a message when ngspice is not
// installed, except under CI.
#include <doctest/doctest.h>

#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <map>
#include <regex>
#include <sstream>

#include <unistd.h>

#include "netcheck/file/board_file.hpp"
#include "netcheck/voltage/dc_deck.hpp"
#include "netcheck/voltage/ngspice_session.hpp"
#include "test_support.hpp"
#include "voltage_support.hpp"

namespace fs = std::filesystem;
using namespace netcheck;
using voltage_support::circuitOf;

namespace {

bool batchNgspiceReady() {
    if (std::system("command -v ngspice > /dev/null 2>&1") == 0) return true;
    if (std::getenv("CI") != nullptr) FAIL("ngspice is not installed but CI is set");
    MESSAGE("ngspice not installed: the batch cross-check is skipped");
    return false;
}

fs::path workFolder() {
    const char* artifacts = std::getenv("STRIPSMITH_ARTIFACTS");
    const fs::path base = artifacts != nullptr
                              ? fs::path(artifacts)
                              : fs::temp_directory_path() / ("stripsmith-" + std::to_string(getpid()));
    const fs::path folder = base / "bench-voltages-ngspice";
    fs::create_directories(folder);
    return folder;
}

/// Node voltages printed by `ngspice -b` for the deck (`print all` after `op`).
std::map<std::string, double> batchVoltages(const std::vector<std::string>& deck) {
    const fs::path folder = workFolder();
    {
        std::ofstream out(folder / "deck.cir");
        for (const std::string& line : deck) out << line << "\n";
        std::ofstream wrapper(folder / "wrapper.cir");
        wrapper << "* wrapper\n.control\nsource deck.cir\nop\nprint all\nquit\n.endc\n.end\n";
    }
    const std::string command =
        "cd '" + folder.string() + "' && ngspice -n -b wrapper.cir > output.txt 2>&1";
    CHECK(std::system(command.c_str()) == 0);
    std::istringstream output(test_support::readTextFile((folder / "output.txt").string()));
    std::map<std::string, double> volts;
    static const std::regex kLine(R"(^\s*([a-z0-9_#]+)\s*=\s*([-+0-9.eE]+)\s*$)");
    std::string line;
    std::smatch match;
    while (std::getline(output, line)) {
        if (std::regex_match(line, match, kLine)) volts[match[1].str()] = std::stod(match[2].str());
    }
    return volts;
}

void crossCheck(const Circuit& circuit, const Board* board, const DcModelOptions& options = {}) {
    const DcDeckResult built = buildDcDeck(circuit, board, options);
    INFO(built.error);
    REQUIRE(built.deck);
    const std::vector<std::string> lines = built.deck->lines(built.deck->nominal());
    const std::vector<std::string> nodes = built.deck->nodes();
    const OperatingPoint inProcess = runOperatingPoint(lines, nodes);
    INFO(inProcess.error);
    REQUIRE(inProcess.ok);
    const std::map<std::string, double> batch = batchVoltages(lines);
    int compared = 0;
    for (std::size_t i = 0; i < nodes.size(); ++i) {
        if (nodes[i] == "0") continue;
        CAPTURE(nodes[i]);
        const auto found = batch.find(nodes[i]);
        if (std::isnan(inProcess.volts[i])) {
            // A net no element touches (only capacitors, an IC): no node in either run.
            CHECK(found == batch.end());
            continue;
        }
        REQUIRE(found != batch.end());
        CHECK(std::abs(found->second - inProcess.volts[i]) < 1e-3);
        ++compared;
    }
    CHECK(compared > 0);
}

}  // namespace

TEST_CASE("bench voltages against ngspice -b") {
    if (!batchNgspiceReady()) return;
    SUBCASE("every part model in one circuit") {
        crossCheck(
            circuitOf(
                {{"BT1", "battery", "12V", {"+", "-"}},
                 {"R1", "resistor", "39k", {"1", "2"}},
                 {"R2", "resistor", "3k9", {"1", "2"}},
                 {"RC", "resistor", "10k", {"1", "2"}},
                 {"RE", "resistor", "1k5", {"1", "2"}},
                 {"Q1", "bjt", "BC547", {"C", "B", "E"}},
                 {"Q2", "bjt", "BC557", {"C", "B", "E"}},
                 {"R3", "resistor", "10k", {"1", "2"}},
                 {"J1", "jfet", "J201", {"D", "G", "S"}},
                 {"RD", "resistor", "4k7", {"1", "2"}},
                 {"RS", "resistor", "1k", {"1", "2"}},
                 {"M1", "mosfet", "2N7000", {"D", "G", "S"}},
                 {"RM", "resistor", "1k", {"1", "2"}},
                 {"LED1", "led", "green", {"A", "K"}},
                 {"D1", "zener", "5V6", {"A", "K"}},
                 {"D2", "diode", "1N4148", {"A", "K"}},
                 {"U1", "regulator", "78L05", {"IN", "GND", "OUT"}},
                 {"VR1", "pot", "A100k", {"1", "2", "3"}},
                 {"L1", "inductor", "10m", {"1", "2"}},
                 {"C1", "electrolytic", "10u", {"+", "-"}}},
                {{"VCC", {"BT1.+", "R1.1", "RC.1", "Q2.E", "RD.1", "RM.1", "U1.IN", "VR1.3"}},
                 {"B", {"R1.2", "R2.1", "Q1.B"}},
                 {"C", {"RC.2", "Q1.C", "Q2.B"}},
                 {"E", {"Q1.E", "RE.1"}},
                 {"C2", {"Q2.C", "R3.1"}},
                 {"D", {"RD.2", "J1.D"}},
                 {"S", {"J1.S", "RS.1"}},
                 {"MD", {"RM.2", "M1.D", "LED1.A"}},
                 {"W", {"VR1.2", "M1.G", "L1.1"}},
                 {"Z", {"L1.2", "D1.K", "D2.A"}},
                 {"OUT", {"U1.OUT", "C1.+"}},
                 {"GND", {"BT1.-", "R2.2", "RE.2", "R3.2", "J1.G", "RS.2", "M1.S", "LED1.K",
                          "D1.A", "D2.K", "U1.GND", "VR1.1", "C1.-"}}}),
            nullptr);
    }
    SUBCASE("the sample boards") {
        for (const char* name : {"samples/astable.board.json", "samples/flasher.board.json",
                                 "samples/headphone-amp.board.json"}) {
            CAPTURE(name);
            const std::string path = test_support::sourcePath(name);
            const auto board = readBoard(test_support::readTextFile(path), path);
            REQUIRE(board.ok());
            REQUIRE(board.value->circuit);
            DcModelOptions options;
            options.supplyVolts = 9;
            crossCheck(*board.value->circuit, &*board.value, options);
        }
    }
}
