import { z } from "zod";

// zod compiles fast parsers with `new Function` after probing whether eval is allowed; under our
// content security policy the probe itself is reported as a violation. In the browser, parse
// without compiling (forms parse a few fields; the difference doesn't show).
z.config({ jitless: true });
