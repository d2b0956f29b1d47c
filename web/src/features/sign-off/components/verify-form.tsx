import { Alert, Button, Form, Input, Upload } from 'antd';
import { useState } from 'react';
import { fingerprintOfSheetPdf, readFingerprint } from '../lib/read-fingerprint';

/**
 * Where a person gives the fingerprint to check: typed or pasted from a printed sheet (spaces,
 * line breaks and capitals are fine), or read from a sign-off PDF dropped on the page.
 */
export function VerifyForm({
  initial,
  onFingerprint,
}: {
  initial?: string;
  onFingerprint: (fingerprint: string) => void;
}) {
  const [problem, setProblem] = useState<string>();
  const [fileProblem, setFileProblem] = useState<string>();
  return (
    <>
      <Form
        layout="vertical"
        requiredMark={false}
        initialValues={{ fingerprint: initial ?? '' }}
        onFinish={({ fingerprint }: { fingerprint: string }) => {
          const read = readFingerprint(fingerprint);
          if (read) {
            setProblem(undefined);
            onFingerprint(read);
          } else {
            setProblem(
              'Fingerprint must be the 64 letters and digits (0–9, a–f) printed on the sheet.',
            );
          }
        }}
      >
        <Form.Item
          label="Fingerprint"
          name="fingerprint"
          extra="Paste or type it as printed; spaces, line breaks and capitals do not matter."
          validateStatus={problem ? 'error' : undefined}
          help={problem}
        >
          <Input.TextArea autoSize={{ minRows: 2, maxRows: 4 }} className="lw-mono" />
        </Form.Item>
        <Button type="primary" htmlType="submit">
          Verify
        </Button>
      </Form>
      <Upload.Dragger
        style={{ marginTop: 16 }}
        accept="application/pdf,.pdf"
        showUploadList={false}
        beforeUpload={(file) => {
          void fingerprintOfSheetPdf(file).then((found) => {
            if (found) {
              setFileProblem(undefined);
              onFingerprint(found);
            } else {
              setFileProblem(
                `${file.name} is not a Loftwright sign-off PDF: it carries no fingerprint.`,
              );
            }
          });
          // Read here, in the browser; nothing is uploaded.
          return false;
        }}
      >
        <p>Or drop a sign-off PDF here (or choose one) to read its fingerprint.</p>
        <p style={{ opacity: 0.8 }}>The file stays on this device.</p>
      </Upload.Dragger>
      {fileProblem ? (
        <Alert type="error" showIcon style={{ marginTop: 12 }} title={fileProblem} />
      ) : null}
    </>
  );
}
