import type { QueryInterface } from "sequelize";
import * as m001 from "./001-companies-users-rigs";
import * as m002 from "./002-guides";
import * as m003 from "./003-cases";
import * as m004 from "./004-rig-torque-specs";
import * as m005 from "./005-board";
import * as m006 from "./006-board-people-index";
import * as m007 from "./007-board-wide-index";
import * as m008 from "./008-board-rollups";
import * as m009 from "./009-people";
import * as m010 from "./010-password-resets";
import * as m011 from "./011-session-epoch";
import * as m012 from "./012-time-zone-and-handoff-record";
import * as m013 from "./013-sessions";
import * as m014 from "./014-throttling";
import * as m015 from "./015-field-math-name";
import * as m016 from "./016-rig-pump-and-agitator";
import * as m017 from "./017-photo-phone-id";
import * as m018 from "./018-load-rules-and-pace";
import * as m019 from "./019-service-rules";
import * as m020 from "./020-reports-version";
import * as m021 from "./021-rig-cards";
import * as m022 from "./022-jobs";
import * as m023 from "./023-board-job-mix";
import * as m024 from "./024-person-language";

export interface Migration {
  name: string;
  up(qi: QueryInterface): Promise<void>;
  down(qi: QueryInterface): Promise<void>;
}

/** Every migration, in the order it runs. Add new ones at the end; never edit a landed one. */
export const migrations: Migration[] = [
  { name: "001-companies-users-rigs", ...m001 },
  { name: "002-guides", ...m002 },
  { name: "003-cases", ...m003 },
  { name: "004-rig-torque-specs", ...m004 },
  { name: "005-board", ...m005 },
  { name: "006-board-people-index", ...m006 },
  { name: "007-board-wide-index", ...m007 },
  { name: "008-board-rollups", ...m008 },
  { name: "009-people", ...m009 },
  { name: "010-password-resets", ...m010 },
  { name: "011-session-epoch", ...m011 },
  { name: "012-time-zone-and-handoff-record", ...m012 },
  { name: "013-sessions", ...m013 },
  { name: "014-throttling", ...m014 },
  { name: "015-field-math-name", ...m015 },
  { name: "016-rig-pump-and-agitator", ...m016 },
  { name: "017-photo-phone-id", ...m017 },
  { name: "018-load-rules-and-pace", ...m018 },
  { name: "019-service-rules", ...m019 },
  { name: "020-reports-version", ...m020 },
  { name: "021-rig-cards", ...m021 },
  { name: "022-jobs", ...m022 },
  { name: "023-board-job-mix", ...m023 },
  { name: "024-person-language", ...m024 },
];
