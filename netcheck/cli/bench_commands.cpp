// The bench commands parse their own options, so that the checker's option parsing stays as it
// is; the board and circuit are read the same way (size limits, located errors).
#include "netcheck/cli/bench_commands.hpp"

#include <algorithm>
#include <cerrno>
#include <cstdio>
#include <iostream>
#include <system_error>

#include "netcheck/cli/cli_io.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/file/file_io.hpp"
#include "netcheck/model/printable.hpp"
#include "netcheck/model/value.hpp"
#include "netcheck/spice/circuit_loader.hpp"
#include "netcheck/voltage/bench_voltages.hpp"
#include "netcheck/voltage/jfet_bias.hpp"
#include "netcheck/voltage/value_reading.hpp"
#include "netcheck/voltage/voltage_report.hpp"

namespace netcheck_cli {

namespace {

constexpr int kDone = 0;
constexpr int kBadInput = 2;

constexpr const char* kVoltagesUsage =
    "usage: netcheck --voltages [--json] [--circuit FILE] [--supply VOLTS] [--nominal-only] BOARD\n"
    "\n"
    "What the meter should read: every net's expected DC voltage (black lead on ground) with its\n"
    "range over the parts' tolerances and a hole to probe, from a DC operating point of the\n"
    "circuit run by ngspice. --supply gives the voltage of batteries and DC jacks whose value\n"
    "names none. For extra-low-voltage circuits only; the figures are estimates.\n"
    "Exit status: 0 computed, 2 unusable input (no supply, no ground, unreadable files).\n";

constexpr const char* kJfetUsage =
    "usage: netcheck --jfet-bias [--json] --supply VOLTS --rd OHMS --target VOLTS\n"
    "                (--idss AMPS --vp VOLTS | --measured RS:VD --measured RS:VD)\n"
    "\n"
    "Self-biased common-source N-channel JFET stage: the source resistor that puts the drain at\n"
    "the target voltage (Shockley's square law), the nearest E12 and E24 values either side with\n"
    "the drain voltage each gives, and the headroom. With two --measured readings (the drain\n"
    "voltage with two known source resistors fitted) IDSS and VP of the device in hand are\n"
    "estimated first. Values as on parts: 4k7, 3m, -2.5.\n"
    "Exit status: 0 computed, 2 unusable input or a target no resistor reaches.\n";

struct UsageError {
    std::string message;
};

int fail(const std::string& message) {
    std::cerr << "netcheck: " << netcheck::escapeControls(message) << "\n";
    return kBadInput;
}

/// A number as makers write part values: "4k7", "3m", "-2.5", "9V".
double quantityArgument(const std::string& option, const std::string& text) {
    std::string body = text;
    const bool negative = !body.empty() && body.front() == '-';
    if (negative) body.erase(0, 1);
    const auto quantity = netcheck::parseQuantity(body);
    if (!quantity || !quantity->taper.empty()) {
        throw UsageError{option + " takes a number such as 4k7, 3m or -2.5 (got \"" + text + "\")"};
    }
    return negative ? -quantity->magnitude : quantity->magnitude;
}

std::string next(const std::vector<std::string>& args, std::size_t& i) {
    if (i + 1 >= args.size()) throw UsageError{args[i] + " needs a value"};
    return args[++i];
}

int runVoltages(const std::vector<std::string>& args) {
    std::string boardFile;
    std::optional<std::string> circuitFile;
    netcheck::BenchOptions options;
    bool json = false;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& arg = args[i];
        if (arg == "--voltages") continue;
        if (arg == "--help" || arg == "-h") return emit(kVoltagesUsage) ? kDone : kBadInput;
        if (arg == "--json") {
            json = true;
        } else if (arg == "--nominal-only") {
            options.ranges = false;
        } else if (arg == "--circuit") {
            circuitFile = next(args, i);
        } else if (arg == "--supply") {
            const std::string volts = next(args, i);
            options.models.supplyVolts = netcheck::voltageInValue(volts)
                                             ? netcheck::voltageInValue(volts)
                                             : quantityArgument(arg, volts);
        } else if (arg.size() > 1 && arg[0] == '-') {
            throw UsageError{"unknown option " + arg + " for --voltages"};
        } else if (boardFile.empty()) {
            boardFile = arg;
        } else {
            throw UsageError{"only one board file, please (got " + boardFile + " and " + arg + ")"};
        }
    }
    if (boardFile.empty()) throw UsageError{"no board file given"};
    const auto board = load(boardFile, [](std::string_view text, std::string_view name) {
        return netcheck::readBoard(text, name);
    });
    if (!board) return kBadInput;
    std::optional<netcheck::Circuit> circuit;
    if (circuitFile) {
        circuit = load(*circuitFile, [](std::string_view text, std::string_view name) {
            return netcheck::loadCircuitText(text, name);
        });
        if (!circuit) return kBadInput;
    }
    const netcheck::BenchVoltagesResult result =
        netcheck::computeBenchVoltages(*board, circuit ? &*circuit : nullptr, options);
    if (!result.value) return fail("cannot compute the voltages: " + result.error);
    const bool written = emit(json ? netcheck::benchVoltagesJson(*result.value).dump(2) + "\n"
                                   : netcheck::formatBenchVoltagesText(*result.value));
    return written ? kDone : kBadInput;
}

std::string ohms(double value) {
    return netcheck::formatIec(value, false);
}

std::string biasLine(const netcheck::JfetBias& bias) {
    char text[200];
    std::snprintf(text, sizeof text, "VD %.2f V, ID %.3g mA, VGS %.2f V, headroom %.2f V up, %.2f V down",
                  bias.drain, bias.drainCurrent * 1e3, bias.gateSource, bias.headroomUp,
                  bias.headroomDown);
    return text;
}

nlohmann::json biasJson(const netcheck::JfetBias& bias) {
    return {{"rs", bias.sourceResistor},        {"id", bias.drainCurrent},
            {"vgs", bias.gateSource},           {"vs", bias.source},
            {"vd", bias.drain},                 {"headroom_up", bias.headroomUp},
            {"headroom_down", bias.headroomDown}};
}

netcheck::DrainReading readingArgument(const std::string& text) {
    const std::size_t colon = text.find(':');
    if (colon == std::string::npos) {
        throw UsageError{"--measured takes RS:VD, e.g. 1k:6.2 (got \"" + text + "\")"};
    }
    return {quantityArgument("--measured", text.substr(0, colon)),
            quantityArgument("--measured", text.substr(colon + 1))};
}

int runJfetBias(const std::vector<std::string>& args) {
    std::optional<double> supply, rd, target, idss, vp;
    std::vector<netcheck::DrainReading> readings;
    bool json = false;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& arg = args[i];
        if (arg == "--jfet-bias") continue;
        if (arg == "--help" || arg == "-h") return emit(kJfetUsage) ? kDone : kBadInput;
        if (arg == "--json") json = true;
        else if (arg == "--supply") supply = quantityArgument(arg, next(args, i));
        else if (arg == "--rd") rd = quantityArgument(arg, next(args, i));
        else if (arg == "--target") target = quantityArgument(arg, next(args, i));
        else if (arg == "--idss") idss = quantityArgument(arg, next(args, i));
        else if (arg == "--vp") vp = quantityArgument(arg, next(args, i));
        else if (arg == "--measured") readings.push_back(readingArgument(next(args, i)));
        else throw UsageError{"unknown argument " + arg + " for --jfet-bias"};
    }
    if (!supply || !rd || !target) throw UsageError{"--jfet-bias needs --supply, --rd and --target"};
    const netcheck::JfetStage stage{*supply, *rd};
    netcheck::JfetDevice device;
    std::string from;
    if (readings.size() == 2 && !idss && !vp) {
        const netcheck::JfetEstimate estimate = netcheck::estimateJfet(stage, readings[0], readings[1]);
        if (!estimate.device) return fail(estimate.error);
        device = *estimate.device;
        from = "estimated from the two readings";
    } else if (readings.empty() && idss && vp) {
        device = {*idss, -std::abs(*vp)};
        from = "as given";
    } else {
        throw UsageError{"give either --idss and --vp, or two --measured readings"};
    }
    const netcheck::JfetAdviceResult result = netcheck::sourceResistorFor(device, stage, *target);
    if (!result.advice) return fail(result.error);
    const netcheck::SourceResistorAdvice& advice = *result.advice;
    if (json) {
        nlohmann::json preferred = nlohmann::json::array();
        for (const auto& choice : advice.preferred) {
            nlohmann::json item = biasJson(choice.bias);
            item["series"] = netcheck::seriesName(choice.series);
            item["side"] = choice.below ? "below" : "above";
            preferred.push_back(item);
        }
        return emit(nlohmann::json{{"idss", device.idss}, {"vp", device.vp}, {"device", from},
                                   {"exact", biasJson(advice.exact)}, {"preferred", preferred}}
                        .dump(2) + "\n")
                   ? kDone
                   : kBadInput;
    }
    char head[200];
    std::snprintf(head, sizeof head, "JFET: IDSS %.3g mA, VP %.2f V (%s)\n", device.idss * 1e3,
                  device.vp, from.c_str());
    std::string out = head;
    char exact[64];
    std::snprintf(exact, sizeof exact, "%.1f ohm", advice.exact.sourceResistor);
    out += std::string("Exact source resistor: ") + exact + ": " + biasLine(advice.exact) + "\n";
    for (const auto& choice : advice.preferred) {
        out += std::string(netcheck::seriesName(choice.series)) + (choice.below ? " below: " : " above: ") +
               ohms(choice.bias.sourceResistor) + ": " + biasLine(choice.bias) + "\n";
    }
    out += "Headroom down is the drain's distance above source + |VP|. Estimates from the square "
           "law: trim on the bench. Extra-low-voltage circuits only.\n";
    return emit(out) ? kDone : kBadInput;
}

}  // namespace

std::optional<int> runBenchCommand(const std::vector<std::string>& args) {
    const bool voltages = std::find(args.begin(), args.end(), "--voltages") != args.end();
    const bool jfet = std::find(args.begin(), args.end(), "--jfet-bias") != args.end();
    if (!voltages && !jfet) return std::nullopt;
    try {
        if (voltages && jfet) throw UsageError{"--voltages and --jfet-bias are separate commands"};
        return voltages ? runVoltages(args) : runJfetBias(args);
    } catch (const UsageError& error) {
        std::cerr << "netcheck: " << netcheck::escapeControls(error.message) << "\n"
                  << (voltages ? kVoltagesUsage : kJfetUsage);
    } catch (const std::exception& error) {
        std::cerr << "netcheck: " << netcheck::escapeControls(error.what()) << "\n";
    }
    return kBadInput;
}

}  // namespace netcheck_cli
