#include "meter_table.hpp"

#include "netcheck/voltage/voltage_report.hpp"
#include "sheet_table.hpp"

namespace sheet {

void drawMeterTable(PageFlow& flow, const netcheck::BenchVoltagesResult& result) {
    drawHeading(flow, "What the meter should read (DC, black lead on ground)");
    if (!result.value) {
        drawParagraph(flow, "No figures: " + result.error + ".");
        return;
    }
    const netcheck::BenchVoltages& voltages = *result.value;
    for (const std::string& caution : netcheck::benchCautions()) {
        drawParagraph(flow, caution, Weight::Bold);
    }
    Table table{{{"net", 1}, {"probe at"}, {"nominal", 0, Align::Right}, {"range", 1}}, {}, true};
    for (const netcheck::NetReading& net : voltages.nets) {
        const bool known = net.state == netcheck::NetState::Known;
        std::string name = net.net == voltages.ground ? net.net + " (black lead)" : net.net;
        table.rows.push_back(
            {name, net.probe.empty() ? "-" : net.probe,
             known ? netcheck::formatVolts(net.nominal) : "-",
             known ? netcheck::formatVolts(net.low) + " to " + netcheck::formatVolts(net.high)
                   : "no figure: " + net.why});
    }
    drawTable(flow, table);
    drawParagraph(flow, "Ranges: " + voltages.method + ".");
    for (const std::string& note : voltages.notes) drawParagraph(flow, note);
}

}  // namespace sheet
