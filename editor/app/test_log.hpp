// Lines for the scripted end-to-end tests. With STRIPSMITH_E2E_LOG set, the editor prints
// "STRIPSMITH_E2E <event> ..." on stderr when something a test waits on changes: the status line,
// where a button, hole or lug is on screen, which dialogs are open, what a circuit load found.
// Off otherwise, so a maker's editor prints nothing. One method per event.
#pragma once

#include <map>
#include <string>

#include <imgui.h>

#include "netcheck/check/check_report.hpp"

namespace stripsmith {

class TestLog {
public:
    TestLog() = default;
    explicit TestLog(bool on) : on_(on) {}
    /// On when STRIPSMITH_E2E_LOG is set.
    static TestLog fromEnvironment();
    bool on() const { return on_; }

    /// True (and remembered) when logging is on and `value` differs from the last one seen for
    /// `topic`: events that describe a state are printed only when it changes, to keep the log
    /// short.
    bool changed(const std::string& topic, const std::string& value);

    void status(const std::string& message) const { line("status " + message); }
    void note(const std::string& text) const { line("note " + text); }
    /// The status line's left part as drawn, when it changes: "pointer-line A5  net VCC  meter:
    /// 9.00 V (8.55 V to 9.45 V)", or the tool's hint. (Not "status ...": that is the last action.)
    void pointerLine(const std::string& text) const { line("pointer-line " + text); }
    void finding(const netcheck::Finding& finding) const {
        line("finding " + std::string(finding.id()) + " " + finding.message);
    }
    void dialogs(const std::string& state) {
        if (changed("dialogs", state)) line("dialogs " + state);
    }
    /// The last ImGui item's centre, "item NAME X Y", when it moved: scripts click there.
    void item(const std::string& name);
    /// The Circuit panel's text as last read, when it changes: "circuit-text ok parts P nets N",
    /// or "circuit-text error LINE:COLUMN MESSAGE" for its first error.
    void circuitText(const std::string& state) {
        if (changed("circuit-text", state)) line("circuit-text " + state);
    }
    /// The menu bar's check summary as shown, "summary TEXT", when it changes.
    void summary(const std::string& text) {
        if (changed("summary", text)) line("summary " + text);
    }
    /// The last item's rectangle and the one it has to fit in (its table cell, its window), when
    /// either changes: "fit NAME X0 Y0 X1 Y1 in X0 Y0 X1 Y1". Scripts check nothing is cut off.
    void fit(const std::string& name, ImVec2 areaMin, ImVec2 areaMax);
    /// Screen position of hole A1 and the signed hole pitch (negative when mirrored).
    void view(ImVec2 a1, float pitch, bool mirrored, int rows, int cols) const;
    void offboard(const std::string& ref, ImVec2 body) const {
        line("offboard " + ref + " " + xy(body));
    }
    void lug(const std::string& ref, const std::string& pin, ImVec2 at) const {
        line("lug " + ref + "." + pin + " " + xy(at));
    }
    /// At the end of every frame: "frame N revision R keys K buttons B mouse X Y": frames done,
    /// the document's revision, how many key presses (modifiers aside) and mouse-button presses
    /// and releases the editor has taken in so far, and where it last saw the mouse ("- -":
    /// outside the window). Scripts wait for what they sent to be taken before they look for its
    /// effect (or send it again).
    void frame(unsigned revision, unsigned long keysTaken, unsigned long buttonsTaken);

private:
    void line(const std::string& text) const;
    static std::string xy(ImVec2 p);  ///< "X Y" to a tenth of a pixel

    bool on_ = false;
    std::map<std::string, std::string> last_;
    unsigned long frames_ = 0;
};

}  // namespace stripsmith
