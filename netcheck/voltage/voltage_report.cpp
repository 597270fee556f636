#include "netcheck/voltage/voltage_report.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "netcheck/model/printable.hpp"

namespace netcheck {

namespace {

std::string stateName(NetState state) {
    switch (state) {
        case NetState::Known: return "known";
        case NetState::Unknown: return "unknown";
        case NetState::NoDcPath: return "no-dc-path";
    }
    return "unknown";
}

std::string pad(std::string text, std::size_t width) {
    if (text.size() < width) text.append(width - text.size(), ' ');
    return text;
}

/// Rounded to the millivolt, so -0.0004 prints as 0.
double rounded(double volts) {
    const double mv = std::round(volts * 1000) / 1000;
    return mv == 0 ? 0.0 : mv;
}

}  // namespace

std::string formatVolts(double volts) {
    char text[32];
    const double shown = rounded(volts);
    std::snprintf(text, sizeof text, std::abs(shown) < 1 ? "%.3f V" : "%.2f V", shown);
    return text;
}

std::string formatBenchVoltagesText(const BenchVoltages& voltages) {
    std::size_t netWidth = 3, probeWidth = 5;
    for (const NetReading& net : voltages.nets) {
        netWidth = std::max(netWidth, escapeControls(net.net).size());
        probeWidth = std::max(probeWidth, escapeControls(net.probe).size());
    }
    std::string out = "What the meter should read (black lead on " +
                      escapeControls(voltages.ground) + ")\n\n";
    out += pad("net", netWidth) + "  " + pad("probe", probeWidth) + "  " + pad("nominal", 9) +
           "  range\n";
    for (const NetReading& net : voltages.nets) {
        out += pad(escapeControls(net.net), netWidth) + "  " +
               pad(net.probe.empty() ? "-" : escapeControls(net.probe), probeWidth) + "  ";
        if (net.state == NetState::Known) {
            out += pad(formatVolts(net.nominal), 9) + "  " + formatVolts(net.low) + " to " +
                   formatVolts(net.high);
        } else {
            out += pad("-", 9) + "  " + escapeControls(net.why);
        }
        out += net.split ? "  (split on the board)\n" : "\n";
    }
    out += "\nRanges: " + voltages.method + ".\n";
    if (!voltages.models.empty()) {
        out += "\nModels:\n";
        for (const std::string& line : voltages.models) out += "  " + escapeControls(line) + "\n";
    }
    if (!voltages.notes.empty()) {
        out += "\nNotes:\n";
        for (const std::string& line : voltages.notes) out += "  " + escapeControls(line) + "\n";
    }
    out += "\nCautions:\n";
    for (const std::string& line : benchCautions()) out += "  " + line + "\n";
    return out;
}

nlohmann::json benchVoltagesJson(const BenchVoltages& voltages) {
    nlohmann::json nets = nlohmann::json::array();
    for (const NetReading& net : voltages.nets) {
        const bool known = net.state == NetState::Known;
        nlohmann::json item{{"net", net.net},
                            {"state", stateName(net.state)},
                            {"probe", net.probe.empty() ? nlohmann::json() : nlohmann::json(net.probe)},
                            {"nominal", known ? nlohmann::json(rounded(net.nominal)) : nlohmann::json()},
                            {"min", known ? nlohmann::json(rounded(net.low)) : nlohmann::json()},
                            {"max", known ? nlohmann::json(rounded(net.high)) : nlohmann::json()},
                            {"split", net.split}};
        if (!known) item["why"] = net.why;
        nets.push_back(std::move(item));
    }
    return {{"ground", voltages.ground}, {"method", voltages.method},
            {"nets", nets},              {"models", voltages.models},
            {"notes", voltages.notes},   {"cautions", benchCautions()}};
}

}  // namespace netcheck
