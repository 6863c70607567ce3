// Uploads one file with XMLHttpRequest, which (unlike fetch) reports upload progress.
export interface UploadAnswer {
  name: string;
  status: "reading" | "duplicate" | "rejected";
  id?: number;
  duplicateOf?: { id: number | null; message: string };
  error?: { code: string; message: string };
}

export function uploadFile(file: File, onProgress: (fraction: number) => void): Promise<UploadAnswer> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/documents");
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    const failed = (message: string) => resolve({ name: file.name, status: "rejected", error: { code: "network", message } });
    xhr.onerror = () => failed("The upload was cut off before Foldwright got the file. Check the connection and drop the file again.");
    xhr.onload = () => {
      const body = xhr.response as { files?: UploadAnswer[]; error?: { code: string; message: string } } | null;
      if (body?.files?.[0]) resolve(body.files[0]);
      else if (body?.error) resolve({ name: file.name, status: "rejected", error: body.error });
      else failed(`The server answered ${xhr.status} without a result. Drop the file again; if it keeps failing, tell your admin.`);
    };
    const form = new FormData();
    form.append("file", file, file.name);
    xhr.send(form);
  });
}
