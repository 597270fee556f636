// "Properties": edit the one selected element; several selected get the group actions.
#include <imgui.h>
#include <imgui_stdlib.h>

#include "editor/canvas/part_style.hpp"
#include "editor/panels/panels.hpp"
#include "editor/tools/part_factory.hpp"
#include "editor/tools/ref_names.hpp"
#include "netcheck/edit/edit.hpp"
#include "netcheck/model/part_kinds.hpp"

namespace stripsmith {

using netcheck::edit::ElementRef;

namespace {

bool editText(const char* label, const std::string& current, std::string& out) {
    out = current;
    ImGui::SetNextItemWidth(-70);
    return ImGui::InputText(label, &out, ImGuiInputTextFlags_EnterReturnsTrue) && out != current;
}

void replacePart(const EditContext& c, std::size_t index, const netcheck::Part& part, std::string label = {}) {
    c.commands.perform(std::make_unique<netcheck::edit::ReplacePart>(c.doc.board(), index, part, std::move(label)));
}

void partKindCombo(const EditContext& c, std::size_t index, const netcheck::Part& part) {
    ImGui::SetNextItemWidth(-70);
    if (!ImGui::BeginCombo("kind", part.kind.c_str())) return;
    for (const netcheck::PartKind& kind : netcheck::partKinds()) {
        if (kind.offboard) continue;
        if (ImGui::Selectable(std::string(kind.name).c_str(), part.kind == kind.name) && part.kind != kind.name) {
            netcheck::Part changed = part;
            changed.kind = std::string(kind.name);
            // Pins take the new kind's names when the count matches (a resistor becoming a diode).
            const auto names = pinNamesFor(changed.kind, static_cast<int>(part.pins.size()));
            for (std::size_t i = 0; i < changed.pins.size(); ++i) changed.pins[i].name = names[i];
            changed.extra.erase("pinout");
            replacePart(c, index, changed);
        }
    }
    ImGui::EndCombo();
}

void pinoutCombo(const EditContext& c, std::size_t index, const netcheck::Part& part) {
    const auto choices = pinoutChoices(part.kind);
    if (choices.empty() || part.pins.size() != 3) return;
    const std::string current = pinoutLabel(part);
    ImGui::SetNextItemWidth(-70);
    if (ImGui::BeginCombo("pinout", current.c_str())) {
        for (const std::string& choice : choices)
            if (ImGui::Selectable(choice.c_str(), choice == current) && choice != current)
                if (auto changed = applyPinout(part, choice)) replacePart(c, index, *changed, "Set pinout of " + part.ref);
        ImGui::EndCombo();
    }
    if (ImGui::IsItemHovered()) ImGui::SetTooltip("Pick the order printed on your part's datasheet, first hole first.");
}

void bodyChoice(const EditContext& c, std::size_t index, const netcheck::Part& part) {
    if (part.pins.size() != 2) return;
    const BodyStyle style = bodyStyleOf(part);
    if (style == BodyStyle::Resistor || style == BodyStyle::Diode) {
        bool standing = isStanding(part);
        if (ImGui::Checkbox("stands on end", &standing)) {
            netcheck::Part changed = part;
            changed.extra["body"] = standing ? "standing" : "lying";
            replacePart(c, index, changed);
        }
    }
    if (part.kind == "capacitor") {
        const bool ceramic = style == BodyStyle::CeramicCap;
        if (ImGui::RadioButton("ceramic", ceramic) && !ceramic) {
            netcheck::Part changed = part;
            changed.extra["package"] = "ceramic";
            replacePart(c, index, changed);
        }
        ImGui::SameLine();
        if (ImGui::RadioButton("film", !ceramic) && ceramic) {
            netcheck::Part changed = part;
            changed.extra["package"] = "film";
            replacePart(c, index, changed);
        }
    }
}

void partProperties(const EditContext& c, std::size_t index) {
    const netcheck::Part part = c.doc.board().parts[index];
    std::string text;
    if (editText("ref", part.ref, text)) {
        if (text.empty() || refTaken(c.doc.board(), text, part.ref)) {
            c.commands.say("The ref " + text + " is already used (or empty); refs must be unique.");
        } else {
            netcheck::Part changed = part;
            changed.ref = text;
            replacePart(c, index, changed);
        }
    }
    if (editText("value", part.value, text)) {
        netcheck::Part changed = part;
        changed.value = text;
        replacePart(c, index, changed);
    }
    partKindCombo(c, index, part);
    pinoutCombo(c, index, part);
    bodyChoice(c, index, part);
    ImGui::Separator();
    for (const netcheck::Pin& pin : part.pins) ImGui::BulletText("%s in %s", pin.name.c_str(), netcheck::holeName(pin.hole).c_str());
    if (ImGui::Button("Turn 90° (R)")) rotateSelection(c);
}

void linkProperties(const EditContext& c, TestLog& log, std::size_t index) {
    const netcheck::Link link = c.doc.board().links[index];
    ImGui::Text("Link %s to %s", netcheck::holeName(link.from).c_str(), netcheck::holeName(link.to).c_str());
    bool copper = link.copperSide;
    if (ImGui::Checkbox("on the copper side (solder bridge)", &copper)) {
        netcheck::Link changed = link;
        changed.copperSide = copper;
        c.commands.perform(std::make_unique<netcheck::edit::ReplaceLink>(c.doc.board(), index, changed));
    }
    bool insulated = link.insulated;
    const bool toggled = ImGui::Checkbox("insulated (sleeved: may cross leads and links)", &insulated);
    log.item("link-insulated");
    if (toggled) {
        netcheck::Link changed = link;
        changed.insulated = insulated;
        c.commands.perform(std::make_unique<netcheck::edit::ReplaceLink>(c.doc.board(), index, changed));
    }
}

void wireProperties(const EditContext& c, std::size_t index) {
    const netcheck::Wire wire = c.doc.board().wires[index];
    ImGui::Text("Wire %s to %s", wire.from.name().c_str(), wire.to.name().c_str());
    std::string colour;
    if (editText("colour", wire.color, colour)) {
        netcheck::Wire changed = wire;
        changed.color = colour;
        c.commands.perform(std::make_unique<netcheck::edit::ReplaceWire>(c.doc.board(), index, changed));
    }
}

void offboardProperties(const EditContext& c, std::size_t index) {
    const netcheck::OffboardPart part = c.doc.board().offboard[index];
    std::string text;
    auto replace = [&](const netcheck::OffboardPart& changed) {
        c.commands.perform(std::make_unique<netcheck::edit::ReplaceOffboard>(c.doc.board(), index, changed));
    };
    if (editText("ref", part.ref, text)) {
        if (text.empty() || refTaken(c.doc.board(), text, part.ref)) {
            c.commands.say("The ref " + text + " is already used (or empty); refs must be unique.");
        } else {
            auto changed = part;
            changed.ref = text;
            replace(changed);
        }
    }
    if (editText("value", part.value, text)) {
        auto changed = part;
        changed.value = text;
        replace(changed);
    }
    ImGui::Text("%s, lugs:", part.kind.c_str());
    for (const std::string& lug : part.pins) {
        ImGui::SameLine();
        ImGui::TextUnformatted(lug.c_str());
    }
}

}  // namespace

void drawPropertiesPanel(const EditContext& c, TestLog& log, ImVec2 pos, ImVec2 size) {
    if (beginPanel("Properties", pos, size)) {
        if (c.selection.empty()) {
            ImGui::TextDisabled("Nothing selected.");
            ImGui::TextWrapped("Select something on the board to see and change it here.");
        } else if (c.selection.size() > 1) {
            ImGui::Text("%zu items selected", c.selection.size());
            if (ImGui::Button("Turn parts 90° (R)")) rotateSelection(c);
            if (ImGui::Button("Duplicate (Ctrl+D)")) duplicateSelection(c);
            if (ImGui::Button("Delete (Del)")) deleteSelection(c);
        } else {
            const ElementRef ref = *c.selection.begin();
            const auto& board = c.doc.board();
            switch (ref.kind) {
            case ElementRef::Kind::Part: if (ref.index < board.parts.size()) partProperties(c, ref.index); break;
            case ElementRef::Kind::Link: if (ref.index < board.links.size()) linkProperties(c, log, ref.index); break;
            case ElementRef::Kind::Wire: if (ref.index < board.wires.size()) wireProperties(c, ref.index); break;
            case ElementRef::Kind::Offboard: if (ref.index < board.offboard.size()) offboardProperties(c, ref.index); break;
            case ElementRef::Kind::Cut:
                if (ref.index < board.cuts.size()) {
                    const auto& cut = board.cuts[ref.index];
                    ImGui::Text("%s cut %s", cut.kind == netcheck::Cut::Kind::Hole ? "Hole" : "Between-hole",
                                netcheck::cutName(cut).c_str());
                }
                break;
            }
            if (ImGui::Button("Delete (Del)")) deleteSelection(c);
        }
    }
    ImGui::End();
}

}  // namespace stripsmith
