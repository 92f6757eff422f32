/** Messages between the page and the build worker. */
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import type { SizingResult } from '../../generator/sizing/result.ts';
import type { TextUnits } from '../../generator/doc/text-in-units.ts';
import type { PartMeshes, PartName, PartTransforms } from './parts-contract.ts';

export type ExportKind = 'stl' | 'zip' | '3mf' | 'sheet';

export type WorkerRequest =
  | { type: 'build'; id: number; inputs: DesignInputs }
  | { type: 'export'; id: number; inputs: DesignInputs; document: unknown; kind: ExportKind; part?: PartName; units?: TextUnits };

export interface BuiltReply {
  type: 'built';
  id: number;
  sizing: SizingResult;
  meshes: PartMeshes | null;
  transforms: { rest: PartTransforms; seal: PartTransforms } | null;
  sizeMs: number;
  buildMs: number;
  /** the worker's own message when the solids could not be built */
  solidError?: string;
}

export interface ExportFile {
  name: string;
  mime: string;
  bytes: Uint8Array;
}

export type WorkerReply =
  | BuiltReply
  | { type: 'exported'; id: number; files: ExportFile[] }
  | { type: 'error'; id: number; message: string };
