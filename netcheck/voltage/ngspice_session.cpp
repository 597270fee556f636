// The only file that talks to libngspice. ngspice is started once, on first use, with callbacks
// that collect its output (for error messages) instead of printing it.
#include "netcheck/voltage/ngspice_session.hpp"

#include <limits>
#include <mutex>

#include <ngspice/sharedspice.h>

namespace netcheck {

namespace {

/// What ngspice reports back through its callbacks, guarded by the session mutex (ngspice calls
/// them on the caller's thread: every command here runs in the foreground).
struct Session {
    std::mutex mutex;
    bool started = false;
    bool stopped = false;  ///< ngspice asked to quit: it must not be used again
    std::vector<std::string> errors;
};

Session& session() {
    static Session kSession;
    return kSession;
}

int onOutput(char* text, int, void* user) {
    auto* state = static_cast<Session*>(user);
    const std::string line = text != nullptr ? text : "";
    // Lines come as "stdout ..." or "stderr ..."; errors and warnings are on stderr.
    if (line.rfind("stderr ", 0) == 0) state->errors.push_back(line.substr(7));
    return 0;
}

int onStatus(char*, int, void*) {
    return 0;
}

int onExit(int, NG_BOOL, NG_BOOL, int, void* user) {
    static_cast<Session*>(user)->stopped = true;
    return 0;
}

int onBackground(NG_BOOL, int, void*) {
    return 0;
}

int command(const char* text) {
    std::string copy(text);
    return ngSpice_Command(copy.data());
}

/// Caller holds the mutex.
OperatingPoint runLocked(Session& state, const std::vector<std::string>& deck,
                         const std::vector<std::string>& nodes) {
    OperatingPoint result;
    if (!state.started) {
        ngSpice_Init(onOutput, onStatus, onExit, nullptr, nullptr, onBackground, &state);
        state.started = true;
    }
    if (state.stopped) {
        result.error = "ngspice stopped after an earlier error; restart the program";
        return result;
    }
    state.errors.clear();
    std::vector<std::string> lines = deck;
    std::vector<char*> pointers;
    for (std::string& line : lines) pointers.push_back(line.data());
    pointers.push_back(nullptr);
    const int loaded = ngSpice_Circ(pointers.data());
    if (loaded == 0 && !state.stopped) {
        command("op");
        const char* plot = ngSpice_CurPlot();
        // A failed "op" leaves the constants plot current instead of a new "opN" plot.
        if (plot != nullptr && std::string(plot).rfind("op", 0) == 0) {
            result.ok = true;
            for (const std::string& node : nodes) {
                if (node == "0") {
                    result.volts.push_back(0);
                    continue;
                }
                std::string name = node;
                pvector_info vector = ngGet_Vec_Info(name.data());
                // A net no simulated part touches (only capacitors or connectors) is no node
                // of the deck at all: it has no voltage, which settleNets reports.
                const bool read =
                    vector != nullptr && vector->v_realdata != nullptr && vector->v_length >= 1;
                result.volts.push_back(read ? vector->v_realdata[0]
                                            : std::numeric_limits<double>::quiet_NaN());
            }
        }
    }
    if (!result.ok && result.error.empty()) {
        for (const std::string& line : state.errors) {
            result.error += (result.error.empty() ? "" : "; ") + line;
        }
        if (result.error.empty()) result.error = "ngspice found no operating point";
    }
    if (!state.stopped) {
        command("destroy all");
        command("remcirc");
    }
    return result;
}

}  // namespace

OperatingPoint runOperatingPoint(const std::vector<std::string>& deck,
                                 const std::vector<std::string>& nodes) {
    Session& state = session();
    const std::lock_guard<std::mutex> lock(state.mutex);
    return runLocked(state, deck, nodes);
}

std::vector<OperatingPoint> runOperatingPoints(const std::vector<std::vector<std::string>>& decks,
                                               const std::vector<std::string>& nodes) {
    Session& state = session();
    const std::lock_guard<std::mutex> lock(state.mutex);
    std::vector<OperatingPoint> results;
    results.reserve(decks.size());
    for (const auto& deck : decks) results.push_back(runLocked(state, deck, nodes));
    return results;
}

}  // namespace netcheck
