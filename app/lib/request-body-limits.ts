/**
 * How many bytes a request's body may have (server/request-size-limits.ts
 * counts them before React Router reads any). Every form and JSON body is
 * small: 64 KB is far above anything a person types. Two routes take more,
 * each for a documented reason:
 *
 * - POST /api/v1/price-lists: the price-list file (20 MB, the limit the
 *   upload page checks in the browser), plus 1 MB for the supplier, the
 *   column mapping and the multipart framing. The route's multipart parser
 *   holds the file itself to 20 MB while it arrives.
 * - PUT/PATCH /api/v1/designs/:designId/revisions/:revision: a revision's
 *   whole list of lines (up to 200) in one body, about 62 KB at the longest
 *   values and more when indented.
 * - POST /stock/lots/:lotId: a lot certificate (at most 10 MB). The route
 *   itself refuses a larger one beside its file field, by Content-Length
 *   before reading and by its multipart parser while the file arrives
 *   (app/lots/lot-documents.server.ts), and stores nothing; this ceiling,
 *   well above it, only stops a body far too large before the route runs.
 *
 * Pure: no framework, no Node; tested beside itself.
 */
import {
  fileTooLargeMessage,
  maxPriceListBytes,
} from "~/price-lists/decode-csv";

const kilobyte = 1024;
const megabyte = 1024 * kilobyte;

/** The limit on every body no rule below raises. */
export const formAndJsonBodyBytes = 64 * kilobyte;
/** A design revision with all its lines. */
export const designRevisionBodyBytes = 256 * kilobyte;
/** A price-list upload: the file's limit plus room for its form fields. */
export const priceListUploadBodyBytes = maxPriceListBytes + megabyte;
/** The ceiling on a lot certificate's upload (the route's own limit is 10 MB, said beside the field). */
export const lotCertificateBodyCeilingBytes = 32 * megabyte;

export interface BodyLimit {
  bytes: number;
  /** Said to API callers (`{ error: { message, fields? } }`). */
  apiMessage: string;
  /** The field the message belongs to in the API's answer, if any. */
  field?: string;
  /** Said on a page (or to a page's data request) after a form post. */
  pageMessage: string;
}

function sizeText(bytes: number): string {
  return bytes >= megabyte && bytes % megabyte === 0
    ? `${bytes / megabyte} MB`
    : `${Math.round(bytes / kilobyte)} KB`;
}

function plainLimit(bytes: number): BodyLimit {
  const size = sizeText(bytes);
  return {
    bytes,
    apiMessage: `The request is larger than ${size}, the most Turnledger takes here.`,
    pageMessage: `The form is larger than ${size}, the most Turnledger takes from one form. Shorten what you entered and send it again.`,
  };
}

interface RaisedLimit {
  methods: readonly string[];
  /** Matches the path React Router routes by (dot segments resolved). */
  path: RegExp;
  limit: BodyLimit;
}

const raisedLimits: readonly RaisedLimit[] = [
  {
    methods: ["POST"],
    path: /^\/api\/v1\/price-lists\/?$/,
    limit: {
      bytes: priceListUploadBodyBytes,
      apiMessage: fileTooLargeMessage,
      field: "file",
      pageMessage: fileTooLargeMessage,
    },
  },
  {
    methods: ["POST"],
    // The lot page and its data request ("/stock/lots/12.data").
    path: /^\/stock\/lots\/[^/]+\/?$/,
    limit: plainLimit(lotCertificateBodyCeilingBytes),
  },
  {
    methods: ["PUT", "PATCH"],
    path: /^\/api\/v1\/designs\/[^/]+\/revisions\/[^/]+\/?$/,
    limit: plainLimit(designRevisionBodyBytes),
  },
];

const defaultLimit = plainLimit(formAndJsonBodyBytes);

/** The limit on the body of a request with this method to this path. */
export function requestBodyLimit(method: string, path: string): BodyLimit {
  const upper = method.toUpperCase();
  const raised = raisedLimits.find(
    (rule) => rule.methods.includes(upper) && rule.path.test(path),
  );
  return raised?.limit ?? defaultLimit;
}
