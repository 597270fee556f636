// Every edit command in one include, for the editor.
#pragma once

#include "netcheck/edit/command.hpp"
#include "netcheck/edit/compound_command.hpp"
#include "netcheck/edit/cut_commands.hpp"
#include "netcheck/edit/history.hpp"
#include "netcheck/edit/link_commands.hpp"
#include "netcheck/edit/offboard_commands.hpp"
#include "netcheck/edit/part_commands.hpp"
#include "netcheck/edit/resize_board.hpp"
#include "netcheck/edit/selection_commands.hpp"
#include "netcheck/edit/set_circuit.hpp"
#include "netcheck/edit/set_title.hpp"
#include "netcheck/edit/wire_commands.hpp"
