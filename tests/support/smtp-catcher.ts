import { simpleParser, type ParsedMail } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface SmtpCatcher {
  port: number;
  /** Every message received so far, in order. */
  messages: ParsedMail[];
  stop(): Promise<void>;
}

/**
 * A local SMTP server that keeps what it receives. Pass the port of a stopped catcher to start a
 * new one in its place (the "server came back" case); 0 picks a free port.
 */
export async function startSmtpCatcher(port = 0): Promise<SmtpCatcher> {
  const messages: ParsedMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    closeTimeout: 1_000,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          messages.push(mail);
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });

  const listening = await new Promise<number>((resolve, reject) => {
    const onError = (error: Error) => reject(error);
    server.once("error", onError);
    const net = server.listen(port, "127.0.0.1", () => {
      server.off("error", onError);
      const address = net.address();
      if (address === null || typeof address === "string") reject(new Error("SMTP catcher has no TCP address"));
      else resolve(address.port);
    });
  });

  return {
    port: listening,
    messages,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
