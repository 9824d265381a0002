/** The largest catalog CSV an import takes. */
export const MAX_IMPORT_BYTES = 5 * 1024 * 1024;

export const EXPORT_AS_CSV = "export one from your spreadsheet as CSV (comma-separated), or start from the template";

const NOT_CSV_KINDS: readonly { kind: string; extensions: readonly string[]; types: RegExp }[] = [
  { kind: "a spreadsheet workbook", extensions: ["xlsx", "xlsm", "xls", "ods", "numbers"], types: /spreadsheet|ms-excel\.sheet|opendocument/ },
  { kind: "a picture", extensions: ["png", "jpg", "jpeg", "gif", "webp", "heic", "bmp", "tif", "tiff", "svg"], types: /^image\// },
  { kind: "a document", extensions: ["pdf", "doc", "docx", "odt", "rtf", "pages"], types: /^application\/(pdf|msword|vnd\.openxmlformats-officedocument\.wordprocessingml)/ },
  { kind: "an archive", extensions: ["zip", "gz", "7z", "rar", "tar"], types: /^application\/(zip|gzip|x-7z|x-rar|x-tar)/ },
  { kind: "a sound or video file", extensions: ["mp3", "mp4", "mov", "wav", "m4a"], types: /^(audio|video)\// },
];

/**
 * Why a chosen file is clearly not a CSV, judged by its name and type before reading it; null when it
 * may be one (browsers label CSV files text/csv, text/plain, application/vnd.ms-excel or nothing).
 */
export function notCsvFileMessage(file: { name: string; type: string }): string | null {
  const extension = /\.([a-z0-9]+)$/i.exec(file.name)?.[1]?.toLowerCase() ?? "";
  const type = file.type.toLowerCase();
  const match = NOT_CSV_KINDS.find((entry) => entry.extensions.includes(extension) || entry.types.test(type));
  return match ? `"${file.name}" is ${match.kind}, not a CSV file: ${EXPORT_AS_CSV}.` : null;
}

/** "5 MB" for the limit, in the words the upload screen and the API use. */
export const MAX_IMPORT_SIZE_TEXT = `${MAX_IMPORT_BYTES / 1024 / 1024} MB`;
