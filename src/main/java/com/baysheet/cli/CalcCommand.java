package com.baysheet.cli;

import com.baysheet.engine.InputError;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.record.RecordJson;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * {@code baysheet calc FILE.json} (or {@code -} for standard input): one member description in, its
 * calculation record out, as JSON. Exit 0 on success; 2 with one line on standard error for bad input or
 * malformed JSON.
 */
public final class CalcCommand {
    private CalcCommand() {}

    public static final int OK = 0, BAD_INPUT = 2;
    static final String USAGE = "usage: java -jar target/baysheet.jar calc FILE.json   (or - for standard input)";

    private static final ObjectMapper READER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .build();

    /** @param args the arguments after {@code calc}: one file name, or {@code -} */
    public static int run(String[] args, InputStream in, PrintStream out, PrintStream err) {
        if (args.length != 1) {
            err.println(USAGE);
            return BAD_INPUT;
        }
        try {
            JsonNode root = args[0].equals("-") ? READER.readTree(in) : READER.readTree(Files.readAllBytes(Path.of(args[0])));
            if (root == null || root.isMissingNode()) throw new InputError("input", "nothing", "is empty");
            MemberJson.Parsed p = MemberJson.parse(root);
            out.println(RecordJson.write(MemberCalculation.calculate(p.context(), p.input()).record()));
            out.flush();
            return OK;
        } catch (InputError e) {
            err.println("input error: " + e.getMessage());
        } catch (JsonProcessingException e) {
            err.println("malformed JSON: " + e.getOriginalMessage().replace('\n', ' ')
                    + (e.getLocation() == null ? "" : " (line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr() + ")"));
        } catch (IOException e) {
            err.println("cannot read " + args[0] + ": " + e.getMessage());
        }
        return BAD_INPUT;
    }
}
