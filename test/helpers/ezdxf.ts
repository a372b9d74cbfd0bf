import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/** What test/helpers/dxf_dump.py reports about one DXF file (read by ezdxf). */
export interface DxfDump {
  readonly version: string;
  readonly insunits: number;
  readonly errors: readonly string[];
  readonly fixes: readonly string[];
  readonly measurement: number | null;
  readonly extmin: readonly [number, number];
  readonly extmax: readonly [number, number];
  readonly layers: readonly string[];
  readonly layerTable: readonly { readonly name: string; readonly color: number; readonly on: boolean; readonly plot: number }[];
  readonly comments: readonly string[];
  readonly entities: readonly {
    readonly type: string;
    readonly layer: string;
    readonly closed?: boolean;
    readonly points?: readonly (readonly [number, number, number])[];
    readonly z?: readonly number[];
    readonly center?: readonly [number, number];
    readonly radius?: number;
    readonly text?: string;
  }[];
}

/**
 * Read a DXF back with Debian's python3-ezdxf (run with /usr/bin/python3,
 * which has it) and run its audit. Throws with ezdxf's stderr when it fails.
 */
export function ezdxfDump(path: string): DxfDump {
  const script = fileURLToPath(new URL('./dxf_dump.py', import.meta.url));
  const out = execFileSync('/usr/bin/python3', [script, path], { encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
  return JSON.parse(out) as DxfDump;
}
